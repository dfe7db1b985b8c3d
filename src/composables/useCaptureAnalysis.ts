import { computed, onScopeDispose, ref, shallowRef, watch, type Ref } from 'vue'
import type { AnalysisDto, AnalysisListItemDto } from '@shared/api'
import type { AnalysisSettings } from '@shared/types/analysis'
import { isApiError } from '@/api/ApiError'
import * as capturesApi from '@/api/captures'
import type { CaptureListItem } from '@/api/captures'
import { isSameAnalysisSettings } from '@/forms/analysisSettings'
import { createBackoffPoller } from '@/utils/backoffPoller'
import { isCapturePending } from './useCaptureStatusPolling'

/**
 * One capture, its analyses and the one shown. Waits (polling with backoff) while the first
 * analysis or a requested re-analysis is not ready; switching settings shows an existing analysis
 * with those settings, or asks for a new one.
 */
export function useCaptureAnalysis(captureId: Ref<number>) {
  const capture = shallowRef<CaptureListItem | null>(null)
  const analyses = shallowRef<AnalysisListItemDto[]>([])
  const analysis = shallowRef<AnalysisDto | null>(null)
  const error = shallowRef<unknown>(null)
  const requestError = shallowRef<unknown>(null)
  const isLoading = ref(false)
  /** Settings asked for and not yet analysed. */
  const waitingFor = shallowRef<AnalysisSettings | null>(null)

  async function show(analysisId?: number): Promise<void> {
    analysis.value = await capturesApi.getAnalysis(captureId.value, analysisId)
  }

  /** One poll: true while still waiting. */
  async function refresh(): Promise<boolean> {
    const id = captureId.value
    const [loaded, list] = await Promise.all([capturesApi.getCapture(id), capturesApi.listAnalyses(id).catch(() => [] as AnalysisListItemDto[])])
    if (id !== captureId.value) return false
    capture.value = loaded
    analyses.value = list
    if (loaded.status === 'failed') {
      // The worker gave up (its message is on the capture): stop waiting for the re-analysis too.
      waitingFor.value = null
      return false
    }
    const wanted = waitingFor.value
    if (wanted) {
      const match = list.find((item) => isSameAnalysisSettings(item.settings, wanted))
      if (!match) return true
      waitingFor.value = null
      await show(match.id)
      return false
    }
    if (!analysis.value) {
      try {
        await show()
      } catch (caught) {
        if (isApiError(caught) && caught.status === 404 && caught.code === 'analysis-not-ready') return isCapturePending(loaded) || loaded.status === 'done'
        throw caught
      }
    }
    return false
  }

  const poller = createBackoffPoller({ poll: refresh, isHidden: () => document.visibilityState === 'hidden' })
  const onVisibilityChange = () => {
    if (document.visibilityState === 'visible') poller.resume()
  }
  document.addEventListener('visibilitychange', onVisibilityChange)
  onScopeDispose(() => {
    poller.stop()
    document.removeEventListener('visibilitychange', onVisibilityChange)
  })

  async function load(): Promise<void> {
    poller.stop()
    isLoading.value = true
    error.value = null
    try {
      if (await refresh()) poller.start()
    } catch (caught) {
      error.value = caught
    } finally {
      isLoading.value = false
    }
  }

  /** Shows the analysis with these settings, asking the worker for it first if there is none. */
  async function applySettings(settings: AnalysisSettings): Promise<void> {
    requestError.value = null
    const existing = analyses.value.find((item) => isSameAnalysisSettings(item.settings, settings))
    if (existing) {
      waitingFor.value = null
      await show(existing.id).catch((caught: unknown) => (requestError.value = caught))
      return
    }
    try {
      await capturesApi.requestAnalysis(captureId.value, settings)
      waitingFor.value = settings
      poller.start()
    } catch (caught) {
      requestError.value = caught
    }
  }

  async function select(analysisId: number): Promise<void> {
    waitingFor.value = null
    await show(analysisId).catch((caught: unknown) => (requestError.value = caught))
  }

  /** Pins the analysis used for reporting (owners, engineers); null goes back to the default rule. */
  const isPinning = ref(false)
  async function pin(analysisId: number | null): Promise<void> {
    requestError.value = null
    isPinning.value = true
    try {
      capture.value = await capturesApi.pinAnalysis(captureId.value, analysisId)
      analyses.value = await capturesApi.listAnalyses(captureId.value)
      await show(analysisId ?? undefined)
    } catch (caught) {
      requestError.value = caught
    } finally {
      isPinning.value = false
    }
  }

  watch(captureId, () => {
    capture.value = null
    analysis.value = null
    analyses.value = []
    waitingFor.value = null
    void load()
  }, { immediate: true })

  const isWaiting = computed(() => waitingFor.value !== null || (analysis.value === null && capture.value !== null && capture.value.status !== 'failed'))
  return { capture, analyses, analysis, error, requestError, isLoading, waitingFor, isWaiting, isPinning, load, applySettings, select, pin }
}
