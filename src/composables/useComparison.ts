import { computed, watch, type Ref } from 'vue'
import * as resultsApi from '@/api/results'
import type { CompareState } from '@/forms/compareQuery'
import { useRoomsStore } from '@/stores/rooms'
import { useSurveysStore } from '@/stores/surveys'
import { useAsyncState } from './useAsyncState'

/** The room's surveys to pick from and the comparison of the picked ones (two or more). */
export function useComparison(roomId: Ref<number>, state: Ref<CompareState>) {
  const roomsStore = useRoomsStore()
  const surveysStore = useSurveysStore()
  const roomLoad = useAsyncState(roomsStore.fetchRoom)
  const surveysLoad = useAsyncState(surveysStore.fetchSurveys)
  const comparisonLoad = useAsyncState(resultsApi.getComparison)

  watch(roomId, (id) => {
    void roomLoad.run(id)
    void surveysLoad.run(id)
  }, { immediate: true })

  const key = computed(() => `${roomId.value}|${state.value.surveyIds.join(',')}|${state.value.bands}`)
  const isEnough = computed(() => state.value.surveyIds.length >= 2)
  function loadComparison(): void {
    if (isEnough.value) void comparisonLoad.run(roomId.value, state.value.surveyIds, state.value.bands)
  }
  watch(key, loadComparison, { immediate: true })

  const room = computed(() => roomsStore.byId[roomId.value] ?? null)
  const surveys = computed(() => surveysStore.byRoomId[roomId.value] ?? [])
  const comparison = computed(() => (isEnough.value ? comparisonLoad.data.value : null))
  return { room, roomLoad, surveys, surveysLoad, comparison, comparisonLoad, isEnough, loadComparison }
}
