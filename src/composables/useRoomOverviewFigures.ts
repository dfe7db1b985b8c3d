import { computed, type Ref } from 'vue'
import type { RoomDto } from '@shared/api'
import type { RoomDimensions } from '@shared/room'
import { measuredInDateOrder } from '@/roomModel/measuredSurvey'
import { MID_BAND_RANGE_HZ, pickReverberationBasis } from '@/roomModel/reverberationBasis'
import { defaultLayout } from '@/roomModel/defaultLayout'
import { useRoomMeasurements } from './useRoomMeasurements'
import { useRoomModel } from './useRoomModel'
import { useRoomModelFigures } from './useRoomModelFigures'
import { useWorkspaceMaterials } from './useWorkspaceMaterials'

/**
 * The room page's key figures (volume, Schroeder frequency, lowest modes, predicted and measured
 * mid-band T), from the same saved model and measurements as the room-model page.
 */
export function useRoomOverviewFigures(roomId: Ref<number>, room: Ref<RoomDto | null>) {
  const dimensions = computed<RoomDimensions | null>(() => {
    const r = room.value
    return r && r.lengthM !== null && r.widthM !== null && r.heightM !== null ? { lengthM: r.lengthM, widthM: r.widthM, heightM: r.heightM } : null
  })
  const measurements = useRoomMeasurements(roomId)
  const airTemperatureC = computed(() => measuredInDateOrder(measurements.surveys.value).at(-1)?.temperatureC ?? 20)
  const model = useRoomModel(roomId, dimensions, airTemperatureC)
  const library = useWorkspaceMaterials(computed(() => room.value?.workspaceId ?? null))
  // Figures need a box; before the dimensions are known a 1 m cube stands in and nothing is shown.
  const box = computed<RoomDimensions>(() => dimensions.value ?? { lengthM: 1, widthM: 1, heightM: 1 })
  const figures = useRoomModelFigures({
    room: box,
    layout: computed(() => model.layoutDraft.value ?? defaultLayout(box.value, airTemperatureC.value)),
    treatment: model.treatmentDraft,
    materials: library.materials,
    surveys: measurements.surveys,
  })
  const measuredMidBand = computed(() => pickReverberationBasis(measurements.surveys.value, [], MID_BAND_RANGE_HZ))
  return { hasDimensions: computed(() => dimensions.value !== null), figures, measuredMidBand }
}
