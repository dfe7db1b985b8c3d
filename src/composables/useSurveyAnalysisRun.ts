import { ref, watch, type Ref } from 'vue'
import type { SurveyAnalysisProgressDto, SurveyAnalysisSettings } from '@shared/api'
import * as reportInputsApi from '@/api/reportInputs'
import { useAsyncState } from './useAsyncState'

/** "Analyse the whole survey with these settings" and how far it has got (done / pending / failed). */
export function useSurveyAnalysisRun(surveyId: Ref<number>) {
  const progress = ref<SurveyAnalysisProgressDto | null>(null)
  const loadProgress = useAsyncState(async (id: number) => (progress.value = await reportInputsApi.getSurveyAnalysisProgress(id)))
  const start = useAsyncState(async (settings: SurveyAnalysisSettings) => {
    const run = await reportInputsApi.analyseWholeSurvey(surveyId.value, settings)
    await loadProgress.run(surveyId.value)
    return run
  })
  watch(surveyId, (id) => void loadProgress.run(id), { immediate: true })
  return { progress, start, refresh: () => loadProgress.run(surveyId.value) }
}
