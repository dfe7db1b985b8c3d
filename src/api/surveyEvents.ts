import type { SurveyCaptureDeletedEvent, SurveyCaptureEvent } from '@shared/api'
import { apiUrl } from './http'

export interface SurveyEventHandlers {
  onCapture: (event: SurveyCaptureEvent) => void
  onCaptureDeleted: (event: SurveyCaptureDeletedEvent) => void
  /** The server may have missed changes (its database connection came back): read again. */
  onResync: () => void
  /** True once the server said `ready` (changes from then on arrive), false while down (poll meanwhile). */
  onConnection: (isConnected: boolean) => void
}

export interface SurveyEventsOptions {
  /** For tests: the EventSource constructor. */
  createSource?: (url: string) => EventSource
  /** Delay before reopening a stream the browser gave up on, attempt n from 1. */
  reopenDelayMs?: (attempt: number) => number
}

const defaultReopenDelayMs = (attempt: number) => Math.min(2000 * 2 ** (attempt - 1), 60_000)

function parse<T>(message: MessageEvent): T | null {
  try {
    return JSON.parse(String(message.data)) as T
  } catch {
    return null
  }
}

/**
 * Opens a survey's live status stream (server-sent events). The browser reconnects a dropped
 * stream by itself; when it gives up (an HTTP error such as a proxy's 502 while a server
 * restarts) the stream is reopened with a growing delay. Returns a function that closes it.
 */
export function openSurveyEvents(surveyId: number, handlers: SurveyEventHandlers, options: SurveyEventsOptions = {}): () => void {
  const createSource = options.createSource ?? ((url: string) => new EventSource(url, { withCredentials: true }))
  const reopenDelayMs = options.reopenDelayMs ?? defaultReopenDelayMs
  let source: EventSource | null = null
  let reopenTimer: ReturnType<typeof setTimeout> | null = null
  let attempt = 0
  let isClosed = false

  function open(): void {
    const current = createSource(apiUrl(`/surveys/${surveyId}/events`))
    source = current
    current.addEventListener('ready', () => {
      attempt = 0
      handlers.onConnection(true)
    })
    current.addEventListener('error', () => {
      handlers.onConnection(false)
      if (current.readyState !== 2 || isClosed) return // 2 = CLOSED: the browser will not retry
      attempt += 1
      reopenTimer = setTimeout(() => {
        reopenTimer = null
        if (!isClosed) open()
      }, reopenDelayMs(attempt))
    })
    current.addEventListener('capture', (message) => {
      const event = parse<SurveyCaptureEvent>(message as MessageEvent)
      if (event) handlers.onCapture(event)
    })
    current.addEventListener('capture-deleted', (message) => {
      const event = parse<SurveyCaptureDeletedEvent>(message as MessageEvent)
      if (event) handlers.onCaptureDeleted(event)
    })
    current.addEventListener('resync', () => handlers.onResync())
  }

  open()
  return () => {
    isClosed = true
    if (reopenTimer) clearTimeout(reopenTimer)
    source?.close()
    handlers.onConnection(false)
  }
}
