import type { IncomingMessage, ServerResponse } from 'node:http'
import { createChannel, createSession, type Channel } from 'better-sse'
import { Capture } from '../models'
import { describeCapture } from '../services/capturesService'
import type { AnalysisStateRow } from '../services/captureStates'
import type { SurveyCaptureDeletedEvent, SurveyCaptureEvent } from '../../shared/api/captures'
import { logger } from '../logger'
import { ANALYSIS_CHANGES_CHANNEL, type AnalysisChangeNotice, type AnalysisChangesNotice } from './analysisChange'
import { listenToPostgres, type PostgresListener } from './postgresListener'

export interface SurveyEventHub {
  /**
   * Turns the response into a survey's live stream (the caller has checked access). `isStillAllowed`
   * runs every `accessCheckMs`; the stream ends when it says no (signed out, or access removed).
   */
  attach(req: IncomingMessage, res: ServerResponse, surveyId: number, isStillAllowed: () => Promise<boolean>): Promise<void>
  /** Streams open on this server (for tests and health figures). */
  sessionCount(): number
  close(): Promise<void>
}

export interface SurveyEventHubOptions {
  databaseUrl: string
  keepAliveMs?: number
  accessCheckMs?: number
  /** How long a browser waits before reconnecting a dropped stream (the `retry:` field). */
  retryMs?: number
}

const LISTEN_WAIT_MS = 5000

function overrideOf(notice: AnalysisChangeNotice): AnalysisStateRow {
  const date = (value: string | null) => (value === null ? null : new Date(value))
  return {
    id: notice.analysisId,
    captureId: notice.captureId,
    status: notice.status,
    statusMessage: notice.statusMessage,
    error: notice.error,
    queuedAt: new Date(notice.queuedAt),
    enqueuedAt: date(notice.enqueuedAt),
    finishedAt: date(notice.finishedAt),
    headline: notice.headline,
  }
}

/**
 * Server-sent events per survey, fed by the database's change notifications (migration 0012), so
 * every server sees every worker's progress whatever machine it runs on. Events: `ready` (changes
 * from now on will arrive; `isListening: false` if the database is away, then `resync` follows),
 * `capture` (a capture's new state, see SurveyCaptureEvent), `capture-deleted`, and `resync`
 * after the database connection came back (notifications may have been missed: read again).
 */
export function createSurveyEventHub(options: SurveyEventHubOptions): SurveyEventHub {
  const channels = new Map<number, Channel>()
  // One chain per survey keeps its events in commit order although each needs a database read.
  const chains = new Map<number, Promise<void>>()
  const openResponses = new Set<ServerResponse>()
  let listener: PostgresListener | null = null

  async function toEvent(notice: AnalysisChangeNotice): Promise<SurveyCaptureEvent | null> {
    const capture = await Capture.findByPk(notice.captureId)
    if (!capture) return null
    return {
      capture: await describeCapture(capture, overrideOf(notice)),
      analysis: { id: notice.analysisId, status: notice.status, statusMessage: notice.statusMessage, error: notice.error },
    }
  }

  async function deliver(notice: AnalysisChangesNotice): Promise<void> {
    const channel = channels.get(notice.surveyId)
    if (!channel || channel.sessionCount === 0) return
    if (notice.kind === 'capture-deleted') {
      channel.broadcast({ captureId: notice.captureId } satisfies SurveyCaptureDeletedEvent, 'capture-deleted')
      return
    }
    const event = await toEvent(notice)
    if (event) channel.broadcast(event, 'capture')
  }

  function onNotice(payload: string): void {
    let notice: AnalysisChangesNotice
    try {
      notice = JSON.parse(payload) as AnalysisChangesNotice
    } catch {
      return
    }
    if (!channels.has(notice.surveyId)) return
    const previous = chains.get(notice.surveyId) ?? Promise.resolve()
    const next = previous.then(() => deliver(notice)).catch((error: unknown) => logger.warn({ err: error, surveyId: notice.surveyId }, 'could not send a live status event'))
    chains.set(notice.surveyId, next)
    void next.finally(() => {
      if (chains.get(notice.surveyId) === next) chains.delete(notice.surveyId)
    })
  }

  function startListening(): PostgresListener {
    listener ??= listenToPostgres({
      connectionString: options.databaseUrl,
      channel: ANALYSIS_CHANGES_CHANNEL,
      onNotice,
      // Streams open while the listener was away (or before it first connected) missed changes.
      onConnected: () => {
        for (const channel of channels.values()) channel.broadcast({}, 'resync')
      },
    })
    return listener
  }

  function channelOf(surveyId: number): Channel {
    let channel = channels.get(surveyId)
    if (!channel) {
      channel = createChannel()
      channels.set(surveyId, channel)
    }
    return channel
  }

  return {
    async attach(req, res, surveyId, isStillAllowed) {
      // `ready` promises that changes from now on arrive; wait briefly for the listener to say so.
      const isListening = await startListening().whenConnected(LISTEN_WAIT_MS)
      const session = await createSession(req, res, { keepAlive: options.keepAliveMs ?? 15_000, retry: options.retryMs ?? 3000 })
      const channel = channelOf(surveyId)
      channel.register(session)
      openResponses.add(res)
      const accessTimer = setInterval(() => {
        void isStillAllowed()
          .catch(() => true) // a database hiccup is not a reason to drop the stream
          .then((isAllowed) => {
            if (!isAllowed) res.end()
          })
      }, options.accessCheckMs ?? 60_000)
      session.once('disconnected', () => {
        clearInterval(accessTimer)
        openResponses.delete(res)
        if (channel.sessionCount === 0 && channels.get(surveyId) === channel) channels.delete(surveyId)
      })
      session.push({ isListening }, 'ready')
    },
    sessionCount: () => [...channels.values()].reduce((sum, channel) => sum + channel.sessionCount, 0),
    async close() {
      for (const res of openResponses) res.end()
      openResponses.clear()
      channels.clear()
      await listener?.close()
      listener = null
    },
  }
}
