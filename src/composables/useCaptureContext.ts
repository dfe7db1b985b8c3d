import { computed, watch, type Ref } from 'vue'
import { roomModes, speedOfSoundMps } from '@shared/room'
import * as surveysApi from '@/api/surveys'
import type { CaptureListItem } from '@/api/captures'
import type { RoomModeMark } from '@/components/charts/waterfallOption'
import { useRoomsStore } from '@/stores/rooms'
import { useAsyncState } from './useAsyncState'

const MAX_MODE_HZ = 150

/** The survey and room a capture belongs to, and the room's axial modes for the waterfall. */
export function useCaptureContext(capture: Ref<CaptureListItem | null>) {
  const roomsStore = useRoomsStore()
  const surveyLoad = useAsyncState(surveysApi.getSurvey)
  const roomLoad = useAsyncState(roomsStore.fetchRoom)

  watch(() => capture.value?.surveyId, async (surveyId) => {
    if (surveyId === undefined || surveyLoad.data.value?.id === surveyId) return
    const survey = await surveyLoad.run(surveyId)
    if (survey) await roomLoad.run(survey.roomId)
  }, { immediate: true })

  const survey = computed(() => surveyLoad.data.value)
  const room = computed(() => (survey.value ? (roomsStore.byId[survey.value.roomId] ?? null) : null))
  const modes = computed<RoomModeMark[]>(() => {
    const r = room.value
    if (!r || r.lengthM === null || r.widthM === null || r.heightM === null) return []
    const speed = speedOfSoundMps(survey.value?.temperatureC ?? 20)
    // Axial modes up to 150 Hz: the ones that ring longest in a small room; more would crowd the view.
    return roomModes({ lengthM: r.lengthM, widthM: r.widthM, heightM: r.heightM }, { speedOfSoundMps: speed, maxHz: MAX_MODE_HZ })
      .filter((mode) => mode.type === 'axial')
      .map((mode) => ({ frequencyHz: mode.frequencyHz, label: `${mode.indices.join(',')} · ${mode.frequencyHz.toFixed(0)} Hz` }))
  })
  return { survey, room, modes }
}
