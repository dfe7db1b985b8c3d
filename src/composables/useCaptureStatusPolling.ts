import { computed, onScopeDispose, ref, shallowRef, watch, type Ref } from 'vue'
import type { CaptureSortKey } from '@shared/api'
import type { CaptureStatus } from '@shared/jobs/analysisJob'
import * as capturesApi from '@/api/captures'
import type { CaptureListItem } from '@/api/captures'
import type { SurveyEventsOptions } from '@/api/surveyEvents'
import { createBackoffPoller } from '@/utils/backoffPoller'
import { useSurveyEvents } from './useSurveyEvents'

/** Statuses the worker has yet to finish ('uploaded' = accepted while the queue was down). */
const PENDING_STATUSES: readonly CaptureStatus[] = ['uploaded', 'queued', 'analysing']

export function isCapturePending(capture: Pick<CaptureListItem, 'status'>): boolean {
  return PENDING_STATUSES.includes(capture.status)
}

export interface CaptureListSort {
  key: CaptureSortKey
  order: 'asc' | 'desc'
}

const UPLOAD_ORDER: CaptureListSort = { key: 'uploaded', order: 'asc' }
const REFETCH_DEBOUNCE_MS = 500

/**
 * One page of a survey's captures (paged and sorted on the server), kept live: through the
 * survey's event stream while it is connected, else by polling the page with backoff (1 s
 * growing to 10 s) while any capture is pending, paused while the tab is hidden.
 */
export function useCaptureStatusPolling(surveyId: Ref<number>, options: { pageSize?: number; events?: SurveyEventsOptions } = {}) {
  const captures = shallowRef<CaptureListItem[]>([])
  const total = shallowRef(0)
  const page = ref(1)
  const pageSize = ref(options.pageSize ?? 50)
  const sort = ref<CaptureListSort>(UPLOAD_ORDER)
  const error = shallowRef<unknown>(null)
  const isLoading = shallowRef(false)
  const hasLoaded = shallowRef(false)
  let loadedSurveyId = surveyId.value
  let fetchesStarted = 0
  let refetchTimer: ReturnType<typeof setTimeout> | null = null
  const forgotten = new Set<number>()

  async function fetchOnce(): Promise<boolean> {
    const forSurveyId = surveyId.value
    fetchesStarted += 1
    try {
      const list = await capturesApi.listCaptures(forSurveyId, { page: page.value, pageSize: pageSize.value, sort: sort.value.key, order: sort.value.order })
      if (forSurveyId !== surveyId.value) return false
      captures.value = list.items
      total.value = list.total
      error.value = null
      hasLoaded.value = true
      return list.items.some(isCapturePending) && !events.isConnected.value
    } catch (caught) {
      if (forSurveyId === surveyId.value) error.value = caught
      throw caught
    }
  }

  const poller = createBackoffPoller({ poll: fetchOnce, isHidden: () => document.visibilityState === 'hidden' })

  const events = useSurveyEvents(
    computed(() => surveyId.value),
    {
      onCapture: ({ capture }) => {
        if (capture.surveyId === surveyId.value) upsert(capture)
      },
      onCaptureDeleted: ({ captureId }) => forget(captureId),
      onResync: () => void fetchOnce().catch(() => {}),
      // Changes made between our last read and the stream's start are not in the stream.
      onConnected: () => {
        poller.stop()
        if (fetchesStarted > 0) void fetchOnce().catch(() => {})
      },
    },
    options.events,
  )


  function refetchSoon(): void {
    if (refetchTimer !== null) clearTimeout(refetchTimer)
    refetchTimer = setTimeout(() => {
      refetchTimer = null
      void fetchOnce().catch(() => {})
    }, REFETCH_DEBOUNCE_MS)
  }

  /**
   * Puts a capture's new state into the page. A capture not on the page is new when the list is in
   * upload order and it comes after the last one (ids grow); elsewhere the page is read again.
   */
  function upsert(capture: CaptureListItem): void {
    const index = captures.value.findIndex((c) => c.id === capture.id)
    if (index >= 0) {
      captures.value = captures.value.map((c) => (c.id === capture.id ? capture : c))
      return
    }
    const isUploadOrder = sort.value.key === UPLOAD_ORDER.key && sort.value.order === UPLOAD_ORDER.order
    const lastId = captures.value[captures.value.length - 1]?.id ?? 0
    const isLastPage = page.value * pageSize.value >= total.value
    if (!isUploadOrder || capture.id < lastId || !isLastPage) {
      refetchSoon()
      return
    }
    total.value += 1
    if (captures.value.length < pageSize.value) captures.value = [...captures.value, capture]
  }

  /** Loads the current page now; keeps polling while something is pending and the stream is down. */
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

  /** Shows a just-uploaded capture at once (the stream may already have brought it). */
  function track(capture: CaptureListItem): void {
    if (!captures.value.some((c) => c.id === capture.id)) upsert(capture)
    if (isCapturePending(capture) && !events.isConnected.value) poller.start()
  }

  /** Replaces a listed capture by a fresher copy the page got itself (e.g. after excluding it). */
  function replace(capture: CaptureListItem): void {
    upsert(capture)
  }

  /** Drops a deleted capture (called by the page after its own delete, and by the stream). */
  function forget(captureId: number): void {
    if (forgotten.has(captureId)) return
    forgotten.add(captureId)
    captures.value = captures.value.filter((c) => c.id !== captureId)
    total.value = Math.max(0, total.value - 1)
  }

  function showPage(next: { page: number; pageSize: number; sort: CaptureListSort | null }): void {
    const wanted = next.sort ?? UPLOAD_ORDER
    const isSame = next.page === page.value && next.pageSize === pageSize.value && wanted.key === sort.value.key && wanted.order === sort.value.order
    if (isSame) return
    page.value = next.page
    pageSize.value = next.pageSize
    sort.value = wanted
    void load()
  }

  watch(events.isConnected, (isConnected) => {
    if (!isConnected && captures.value.some(isCapturePending)) poller.start()
  })

  const onVisibilityChange = () => {
    if (document.visibilityState === 'visible') poller.resume()
  }
  document.addEventListener('visibilitychange', onVisibilityChange)
  onScopeDispose(() => {
    poller.stop()
    if (refetchTimer !== null) clearTimeout(refetchTimer)
    document.removeEventListener('visibilitychange', onVisibilityChange)
  })

  watch(surveyId, (id) => {
    if (id === loadedSurveyId) return
    poller.stop()
    captures.value = []
    total.value = 0
    page.value = 1
    hasLoaded.value = false
    void load()
  })

  const pendingCount = computed(() => captures.value.filter(isCapturePending).length)
  const doneCount = computed(() => captures.value.filter((c) => c.status === 'done').length)

  return {
    captures,
    total,
    page,
    pageSize,
    sort,
    error,
    isLoading,
    hasLoaded,
    pendingCount,
    doneCount,
    isLive: events.isConnected,
    load,
    track,
    replace,
    forget,
    showPage,
    isPolling: () => poller.isActive(),
  }
}
