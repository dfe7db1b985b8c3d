import { computed, type Ref } from 'vue'
import type { LayoutDto, MaterialDto, TreatmentDto } from '@shared/api'
import {
  boundaryInterference,
  firstReflections,
  linearFrequencyGrid,
  listenerPositionScan,
  modalResponse,
  predictReverberation,
  roomModes,
  roomVolumeM3,
  schroederFrequencyHz,
  speedOfSoundMps,
  type RoomDimensions,
} from '@shared/room'
import { measuredInDateOrder, type MeasuredSurvey } from '@/roomModel/measuredSurvey'
import { reflectionAbsorption } from '@/roomModel/reflectionAbsorption'
import { LOW_BAND_RANGE_HZ, MID_BAND_RANGE_HZ, pickReverberationBasis } from '@/roomModel/reverberationBasis'
import { treatmentToPrediction } from '@/roomModel/treatmentToPrediction'
import { useDebouncedRef } from './useDebouncedRef'

/** Highest mode listed and drawn, Hz (the brief's default). */
export const MODES_MAX_HZ = 300
/** The scan is the costliest sum (29 positions); it follows a drag after this pause, ms. */
const SCAN_DELAY_MS = 200

export interface RoomModelFigureInputs {
  room: Ref<RoomDimensions>
  layout: Ref<LayoutDto>
  treatment: Ref<TreatmentDto>
  materials: Ref<readonly MaterialDto[]>
  surveys: Ref<readonly MeasuredSurvey[]>
}

/** Everything the room page computes in the browser from the dimensions, layout and plan. */
export function useRoomModelFigures(inputs: RoomModelFigureInputs) {
  const { room, layout, treatment, materials, surveys } = inputs
  const latestSurvey = computed(() => measuredInDateOrder(surveys.value).at(-1) ?? null)
  const air = computed(() => ({ temperatureC: layout.value.airTemperatureC, relativeHumidityPercent: latestSurvey.value?.humidityPercent ?? 50 }))
  const speedMps = computed(() => speedOfSoundMps(air.value.temperatureC))
  const volumeM3 = computed(() => roomVolumeM3(room.value))
  const modes = computed(() => roomModes(room.value, { speedOfSoundMps: speedMps.value, maxHz: MODES_MAX_HZ }))

  const prediction = computed(() => {
    try {
      return { result: predictReverberation(treatmentToPrediction(room.value, treatment.value, materials.value, air.value)), problem: null }
    } catch (error) {
      return { result: null, problem: error instanceof Error ? error.message : String(error) }
    }
  })
  const predictedBands = computed(() => prediction.value.result?.bands ?? [])
  const midBand = computed(() => pickReverberationBasis(surveys.value, predictedBands.value, MID_BAND_RANGE_HZ))
  const predictedMidBandS = computed(() => pickReverberationBasis([], predictedBands.value, MID_BAND_RANGE_HZ)?.reverberationTimeS ?? null)
  const lowBand = computed(() => pickReverberationBasis(surveys.value, predictedBands.value, LOW_BAND_RANGE_HZ))
  const schroederHz = computed(() => (midBand.value ? schroederFrequencyHz(midBand.value.reverberationTimeS, volumeM3.value) : null))

  const sources = computed(() => layout.value.speakers.map((s) => ({ xM: s.xM, yM: s.yM, zM: s.zM })))
  const modalInputs = (forLayout: LayoutDto, dampingS: number) => ({
    room: room.value,
    source: forLayout.speakers.map((s) => ({ xM: s.xM, yM: s.yM, zM: s.zM })),
    speedOfSoundMps: speedMps.value,
    reverberationTimeS: dampingS,
  })
  const bassResponse = computed(() => {
    if (!lowBand.value || sources.value.length === 0) return null
    return modalResponse({ ...modalInputs(layout.value, lowBand.value.reverberationTimeS), receiver: layout.value.listener })
  })
  const debouncedLayout = useDebouncedRef(layout, SCAN_DELAY_MS)
  const scan = computed(() => {
    if (!lowBand.value || debouncedLayout.value.speakers.length === 0) return null
    return listenerPositionScan({ ...modalInputs(debouncedLayout.value, lowBand.value.reverberationTimeS), listener: debouncedLayout.value.listener, frequenciesHz: linearFrequencyGrid(20, 300, 1) })
  })

  const reflections = computed(() =>
    firstReflections(
      layout.value.speakers.map((s) => ({ label: s.label, position: { xM: s.xM, yM: s.yM, zM: s.zM } })),
      layout.value.listener,
      room.value,
      { speedOfSoundMps: speedMps.value, absorption: reflectionAbsorption(treatment.value, materials.value) },
    ),
  )
  const notches = computed(() => layout.value.speakers.map((s) => ({ label: s.label, notches: boundaryInterference(s, room.value, { speedOfSoundMps: speedMps.value }) })))

  return { air, speedMps, volumeM3, modes, prediction, predictedBands, midBand, predictedMidBandS, lowBand, schroederHz, bassResponse, scan, reflections, notches, latestSurvey }
}
