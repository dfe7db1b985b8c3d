import { computed, onScopeDispose, ref, shallowRef, watch, type Ref } from 'vue'
import type { AnalysisDto, AnalysisListItemDto } from '@shared/api'
import type { AnalysisSettings } from '@shared/types/analysis'
import { isApiError } from '@/api/ApiError'
import * as capturesApi from '@/api/captures'
import type { CaptureListItem } from '@/api/captures'
import type { SurveyEventsOptions } from '@/api/surveyEvents'
import { isSameAnalysisSettings } from '@/forms/analysisSettings'
import { createBackoffPoller } from '@/utils/backoffPoller'
import { useSurveyEvents } from './useSurveyEvents'

/**
 * One capture, its analyses and the one shown. Waits while the first analysis or a requested
 * re-analysis is not ready: through the survey's event stream while it is connected, else by
 * polling with backoff. Switching settings shows an existing analysis with those settings, or
 * asks for one; a re-analysis that fails ends the wait and leaves the shown analysis as it is.
 */
export function useCaptureAnalysis(captureId: Ref<number>, options: { events?: SurveyEventsOptions } = {}) {
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

  /** Reads the capture (unless a stream event brought it) and its analyses once: true while still waiting. */
  async function refresh(fromEvent?: CaptureListItem): Promise<boolean> {
    const id = captureId.value
    const [loaded, list] = await Promise.all([fromEvent ?? capturesApi.getCapture(id), capturesApi.listAnalyses(id).catch(() => [] as AnalysisListItemDto[])])
    if (id !== captureId.value) return false
    capture.value = loaded
    analyses.value = list
    const wanted = waitingFor.value
    if (wanted) {
      const match = list.find((item) => isSameAnalysisSettings(item.settings, wanted))
      if (match?.status === 'done') {
        waitingFor.value = null
        await show(match.id)
      } else if (match?.status === 'failed' || (!match && loaded.status === 'failed')) {
        // Its message is on the analysis in the list; the analysis shown stays as it was.
        waitingFor.value = null
      } else {
        return true
      }
    }
    if (loaded.status === 'failed') return false
    if (!analysis.value) {
      if (loaded.status !== 'done') return true
      try {
        await show()
      } catch (caught) {
        if (isApiError(caught) && caught.status === 404 && caught.code === 'analysis-not-ready') return true
        throw caught
      }
    }
    return false
  }

  const poller = createBackoffPoller({ poll: async () => (await refresh()) && !events.isConnected.value, isHidden: () => document.visibilityState === 'hidden' })

  const events = useSurveyEvents(
    computed(() => capture.value?.surveyId ?? null),
    {
      onCapture: ({ capture: changed }) => {
        if (changed.id !== captureId.value) return
        capture.value = changed
        void refresh(changed).catch((caught: unknown) => (error.value = caught))
      },
      onCaptureDeleted: ({ captureId: deleted }) => {
        if (deleted === captureId.value) void load()
      },
      onResync: () => void refresh().catch(() => {}),
      onConnected: () => {
        poller.stop()
        void refresh().catch(() => {})
      },
    },
    options.events,
  )
  watch(events.isConnected, (isConnected) => {
    if (!isConnected && isWaiting.value) poller.start()
  })

  const onVisibilityChange = () => {
    if (document.visibilityState === 'visible') poller.resume()
  }
  document.addEventListener('visibilitychange', onVisibilityChange)
  onScopeDispose(() => {
    poller.stop()
    document.removeEventListener('visibilitychange', onVisibilityChange)
  })

  function waitForWorker(): void {
    if (!events.isConnected.value) poller.start()
  }

  async function load(): Promise<void> {
    poller.stop()
    isLoading.value = true
    error.value = null
    try {
      if (await refresh()) waitForWorker()
    } catch (caught) {
      error.value = caught
    } finally {
      isLoading.value = false
    }
  }

  /** Shows the analysis with these settings, asking the worker for it first if there is none. */
  async function applySettings(settings: AnalysisSettings): Promise<void> {
    requestError.value = null
    const existing = analyses.value.find((item) => item.status === 'done' && isSameAnalysisSettings(item.settings, settings))
    if (existing) {
      waitingFor.value = null
      await show(existing.id).catch((caught: unknown) => (requestError.value = caught))
      return
    }
    try {
      await capturesApi.requestAnalysis(captureId.value, settings)
      waitingFor.value = settings
      if (await refresh()) waitForWorker()
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

  watch(
    captureId,
    () => {
      capture.value = null
      analysis.value = null
      analyses.value = []
      waitingFor.value = null
      void load()
    },
    { immediate: true },
  )

  const isWaiting = computed(() => waitingFor.value !== null || (analysis.value === null && capture.value !== null && capture.value.status !== 'failed'))
  return { capture, analyses, analysis, error, requestError, isLoading, waitingFor, isWaiting, isLive: events.isConnected, isPinning, load, applySettings, select, pin }
}
