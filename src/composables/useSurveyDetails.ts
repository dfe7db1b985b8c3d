import { computed, ref, watch, type Ref } from 'vue'
import type { BandResolution } from '@shared/types/analysis'
import * as resultsApi from '@/api/results'
import * as surveysApi from '@/api/surveys'
import { useRoomsStore } from '@/stores/rooms'
import { useAsyncState } from './useAsyncState'

/** The survey page's survey, its room (for permissions) and the survey's spatial average. */
export function useSurveyDetails(roomId: Ref<number>, surveyId: Ref<number>) {
  const roomsStore = useRoomsStore()
  const surveyLoad = useAsyncState(surveysApi.getSurvey)
  const roomLoad = useAsyncState(roomsStore.fetchRoom)
  const summaryLoad = useAsyncState(resultsApi.getSurveySummary)
  const bandResolution = ref<BandResolution>('octave')

  const room = computed(() => roomsStore.byId[roomId.value] ?? null)
  const survey = computed(() => (surveyLoad.data.value?.id === surveyId.value ? surveyLoad.data.value : null))
  const summary = computed(() => (summaryLoad.data.value?.survey.id === surveyId.value ? summaryLoad.data.value : null))

  function refreshSummary(): void {
    void summaryLoad.run(surveyId.value, bandResolution.value)
  }

  watch(roomId, (id) => void roomLoad.run(id), { immediate: true })
  watch(surveyId, (id) => void surveyLoad.run(id), { immediate: true })
  watch([surveyId, bandResolution], refreshSummary, { immediate: true })

  return { room, roomLoad, survey, surveyLoad, summary, summaryLoad, bandResolution, refreshSummary }
}
