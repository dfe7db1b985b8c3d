import { computed, onScopeDispose, shallowRef, watch, type Ref } from 'vue'
import type { CaptureStatus } from '@shared/jobs/analysisJob'
import * as capturesApi from '@/api/captures'
import type { CaptureListItem } from '@/api/captures'
import { createBackoffPoller } from '@/utils/backoffPoller'

/** Statuses the worker has yet to finish ('uploaded' = accepted while the queue was down). */
const PENDING_STATUSES: readonly CaptureStatus[] = ['uploaded', 'queued', 'analysing']

export function isCapturePending(capture: Pick<CaptureListItem, 'status'>): boolean {
  return PENDING_STATUSES.includes(capture.status)
}

/**
 * A survey's captures, kept live while any is pending: polls the list with backoff (1 s growing
 * to 10 s), stops when all are done or failed, and pauses while the tab is hidden.
 */
export function useCaptureStatusPolling(surveyId: Ref<number>) {
  const captures = shallowRef<CaptureListItem[]>([])
  const error = shallowRef<unknown>(null)
  const isLoading = shallowRef(false)
  const hasLoaded = shallowRef(false)
  let loadedSurveyId = surveyId.value

  async function fetchOnce(): Promise<boolean> {
    const forSurveyId = surveyId.value
    try {
      const list = await capturesApi.listCaptures(forSurveyId)
      if (forSurveyId !== surveyId.value) return false
      captures.value = list
      error.value = null
      hasLoaded.value = true
      return list.some(isCapturePending)
    } catch (caught) {
      if (forSurveyId === surveyId.value) error.value = caught
      throw caught
    }
  }

  const poller = createBackoffPoller({ poll: fetchOnce, isHidden: () => document.visibilityState === 'hidden' })

  /** Loads the list now; keeps polling when something is pending. */
  async function load(): Promise<void> {
    isLoading.value = true
    loadedSurveyId = surveyId.value
    try {
      if (await fetchOnce()) poller.start()
    } catch {
      // error is set; the retry button calls load again.
    } finally {
      isLoading.value = false
    }
  }

  /** Shows a just-uploaded capture at once and polls from the shortest delay again. */
  function track(capture: CaptureListItem): void {
    captures.value = [...captures.value.filter((c) => c.id !== capture.id), capture]
    if (isCapturePending(capture)) poller.start()
  }

  function forget(captureId: number): void {
    captures.value = captures.value.filter((c) => c.id !== captureId)
  }

  const onVisibilityChange = () => {
    if (document.visibilityState === 'visible') poller.resume()
  }
  document.addEventListener('visibilitychange', onVisibilityChange)
  onScopeDispose(() => {
    poller.stop()
    document.removeEventListener('visibilitychange', onVisibilityChange)
  })

  watch(surveyId, (id) => {
    if (id === loadedSurveyId) return
    poller.stop()
    captures.value = []
    hasLoaded.value = false
    void load()
  })

  const pendingCount = computed(() => captures.value.filter(isCapturePending).length)
  const doneCount = computed(() => captures.value.filter((c) => c.status === 'done').length)

  return { captures, error, isLoading, hasLoaded, pendingCount, doneCount, load, track, forget, isPolling: () => poller.isActive() }
}
