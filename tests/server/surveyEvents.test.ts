import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { AddressInfo } from 'node:net'
import type { Server } from 'node:http'
import { Worker } from 'bullmq'
import { Redis } from 'ioredis'
import { createApp, type RingdownApp } from '../../server/app'
import { createSurveyEventHub } from '../../server/events/surveyEventHub'
import { RoomShare } from '../../server/models'
import { withoutStoredContent } from '../helpers/hiddenContent'
import { processAnalysisJob } from '../../worker/processAnalysisJob'
import { ANALYSIS_QUEUE_NAME, type AnalysisJobPayload } from '../../shared/jobs/analysisJob'
import { DEFAULT_ANALYSIS_SETTINGS } from '../../shared/jobs/analysisSettingsKey'
import type { SurveyCaptureEvent } from '../../shared/api/captures'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { decayingNoiseWav } from '../helpers/wavFixtures'
import { openEventStream, signInOverHttp, type EventStream, type HttpSession, type SseEvent } from '../helpers/httpSession'

let services: TestServices
let ringdown: RingdownApp
let server: Server
let baseUrl: string
let fixture: WorkspaceFixture
let other: WorkspaceFixture
let engineer: HttpSession
let worker: Worker<AnalysisJobPayload>
let workerConnection: Redis

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp({ ...services, events: createSurveyEventHub({ databaseUrl: services.config.DATABASE_URL, accessCheckMs: 300, keepAliveMs: 1000 }) })
  server = await new Promise((resolve) => {
    const listening = ringdown.app.listen(0, '127.0.0.1', () => resolve(listening))
  })
  baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
  fixture = await createWorkspaceFixture('Xi')
  other = await createWorkspaceFixture('Omicron')
  engineer = await signInOverHttp(baseUrl, fixture.users.engineer.email, FIXTURE_PASSWORD)
  workerConnection = new Redis(services.config.REDIS_URL, { maxRetriesPerRequest: null })
  worker = new Worker<AnalysisJobPayload>(ANALYSIS_QUEUE_NAME, (job) => processAnalysisJob(job, { store: services.store }), { connection: workerConnection, prefix: services.config.QUEUE_PREFIX })
})
afterAll(async () => {
  await worker.close()
  await workerConnection.quit()
  server.closeAllConnections()
  await new Promise<void>((resolve) => server.close(() => resolve()))
  await ringdown.close()
  await services.close()
})

const eventsUrl = (surveyId: number) => `${baseUrl}/api/surveys/${surveyId}/events`

async function upload(session: HttpSession, surveyId: number, seed: number): Promise<number> {
  const form = new FormData()
  form.set('kind', 'impulse')
  form.set('file', new Blob([new Uint8Array(decayingNoiseWav({ seed, durationS: 2 }))]), 'ir.wav')
  const response = await fetch(`${baseUrl}/api/surveys/${surveyId}/captures`, { method: 'POST', headers: { cookie: session.cookie, 'x-csrf-token': session.csrfToken }, body: form })
  expect(response.status).toBe(202)
  return ((await response.json()) as { id: number }).id
}

async function post(session: HttpSession, url: string, body: unknown): Promise<Response> {
  return fetch(`${baseUrl}${url}`, { method: 'POST', headers: { cookie: session.cookie, 'x-csrf-token': session.csrfToken, 'content-type': 'application/json' }, body: JSON.stringify(body) })
}

const captureEvent = (captureId: number, predicate: (event: SurveyCaptureEvent) => boolean = () => true) => (event: SseEvent) =>
  event.event === 'capture' && (event.data as SurveyCaptureEvent).capture.id === captureId && predicate(event.data as SurveyCaptureEvent)

const statusesOf = (stream: EventStream, captureId: number) =>
  stream.events.filter(captureEvent(captureId)).map((event) => (event.data as SurveyCaptureEvent).capture.status)

describe('GET /api/surveys/:surveyId/events', () => {
  it('streams an upload through queued, analysing and done, with the headline at the end', async () => {
    const stream = await openEventStream(eventsUrl(fixture.sharedSurvey.id), engineer.cookie)
    try {
      expect(stream.status).toBe(200)
      expect(stream.contentType).toMatch(/^text\/event-stream/)
      await stream.next((event) => event.event === 'ready')
      const captureId = await upload(engineer, fixture.sharedSurvey.id, 31)
      const done = await stream.next(captureEvent(captureId, (event) => event.capture.status === 'done'), 60_000)
      expect((done.data as SurveyCaptureEvent).capture.headline?.T30S).toBeGreaterThan(0.2)
      const statuses = statusesOf(stream, captureId)
      expect(statuses[0]).toMatch(/^(uploaded|queued)$/)
      expect(statuses.indexOf('analysing')).toBeGreaterThan(statuses.indexOf('queued'))
      expect(statuses.indexOf('done')).toBeGreaterThan(statuses.indexOf('analysing'))
    } finally {
      stream.close()
    }
  })

  it('reports a failed re-analysis as such while the capture stays done, and a deletion', async () => {
    const captureId = await upload(engineer, fixture.sharedSurvey.id, 32)
    const stream = await openEventStream(eventsUrl(fixture.sharedSurvey.id), engineer.cookie)
    try {
      await stream.next((event) => event.event === 'ready')
      // Done before or after the stream opened: wait for the worker through the capture itself.
      let sha256 = ''
      for (let i = 0; i < 600; i++) {
        const capture = (await (await fetch(`${baseUrl}/api/captures/${captureId}`, { headers: { cookie: engineer.cookie } })).json()) as { status: string; sha256: string }
        sha256 = capture.sha256
        if (capture.status === 'done') break
        await new Promise((resolve) => setTimeout(resolve, 100))
      }
      // With its stored file hidden, a re-analysis fails in the worker.
      await withoutStoredContent(services.store, sha256, async () => {
        const response = await post(engineer, `/api/captures/${captureId}/analyses`, { ...DEFAULT_ANALYSIS_SETTINGS, bands: 'third' })
        expect(response.status).toBe(202)
        const analysisId = ((await response.json()) as { analysisId: number }).analysisId
        const settled = await stream.next(captureEvent(captureId, (event) => event.analysis.id === analysisId && ['done', 'failed'].includes(event.analysis.status)), 60_000)
        expect((settled.data as SurveyCaptureEvent).analysis).toMatchObject({ status: 'failed', error: expect.stringMatching(/stored file is missing/) })
        expect((settled.data as SurveyCaptureEvent).capture).toMatchObject({ status: 'done', statusMessage: null })
      })
      const removed = await fetch(`${baseUrl}/api/captures/${captureId}`, { method: 'DELETE', headers: { cookie: engineer.cookie, 'x-csrf-token': engineer.csrfToken } })
      expect(removed.status).toBe(204)
      await stream.next((event) => event.event === 'capture-deleted' && (event.data as { captureId: number }).captureId === captureId)
    } finally {
      stream.close()
    }
  })

  it('says resync after its database connection was cut, and goes on streaming', async () => {
    const stream = await openEventStream(eventsUrl(fixture.sharedSurvey.id), engineer.cookie)
    try {
      await stream.next((event) => event.event === 'ready')
      await services.sequelize.query(`SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = 'ringdown-listener'`)
      await stream.next((event) => event.event === 'resync', 30_000)
      const captureId = await upload(engineer, fixture.sharedSurvey.id, 33)
      await stream.next(captureEvent(captureId, (event) => event.capture.status === 'done'), 60_000)
    } finally {
      stream.close()
    }
  })

  it('refuses the unauthenticated (401) and other workspaces (404), and ends a stream whose access was removed', async () => {
    expect((await fetch(eventsUrl(fixture.sharedSurvey.id))).status).toBe(401)
    const outsider = await signInOverHttp(baseUrl, other.users.owner.email, FIXTURE_PASSWORD)
    const refused = await openEventStream(eventsUrl(fixture.sharedSurvey.id), outsider.cookie)
    expect(refused.status).toBe(404)
    refused.close()
    const viewer = await signInOverHttp(baseUrl, fixture.users.viewer.email, FIXTURE_PASSWORD)
    const stream = await openEventStream(eventsUrl(fixture.sharedSurvey.id), viewer.cookie)
    await stream.next((event) => event.event === 'ready')
    await RoomShare.destroy({ where: { roomId: fixture.sharedRoom.id, userId: fixture.users.viewer.id } })
    await stream.ended
    expect(ringdown.events.sessionCount()).toBe(0)
  })
})
