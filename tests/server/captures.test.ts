import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Queue } from 'bullmq'
import { createApp, type RingdownApp } from '../../server/app'
import { Capture } from '../../server/models'
import { contentKey } from '../../server/storage/contentKeys'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { decayingNoiseWav } from '../helpers/wavFixtures'
import { ANALYSIS_QUEUE_NAME } from '../../shared/jobs/analysisJob'

let services: TestServices
let ringdown: RingdownApp
let a: WorkspaceFixture
let b: WorkspaceFixture
let engineer: ApiAgent
let viewer: ApiAgent
let client: ApiAgent

beforeAll(async () => {
  services = await startTestServices({ UPLOAD_LIMIT_MB: 1 })
  ringdown = createApp(services)
  a = await createWorkspaceFixture('Delta')
  b = await createWorkspaceFixture('Epsilon')
  engineer = await signedInAgent(ringdown.app, a.users.engineer.email, FIXTURE_PASSWORD)
  viewer = await signedInAgent(ringdown.app, a.users.viewer.email, FIXTURE_PASSWORD)
  client = await signedInAgent(ringdown.app, a.users.client.email, FIXTURE_PASSWORD)
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
})

/** Every object in the test's bucket, temporary uploads included. */
const storedFiles = () => services.objectKeys()

async function upload(agent: ApiAgent, surveyId: number, bytes: Uint8Array | null, fields: Record<string, string> = { kind: 'impulse' }, name = 'capture.wav') {
  await agent.refreshCsrf()
  const token = await agent.refreshCsrf()
  const req = agent.agent.post(`/api/surveys/${surveyId}/captures`).set('x-csrf-token', token)
  for (const [key, value] of Object.entries(fields)) req.field(key, value)
  if (bytes) req.attach('file', Buffer.from(bytes), name)
  return req
}

describe('POST /api/surveys/:surveyId/captures — bad uploads leave nothing behind', () => {
  const good = () => decayingNoiseWav()
  const cases: [string, () => Promise<{ status: number; body: { error: { code: string; message: string } } }>, number][] = [
    ['not a WAV', () => upload(engineer, a.sharedSurvey.id, new TextEncoder().encode('this is a text file, not audio at all'.repeat(4)), { kind: 'impulse' }, 'notes.wav'), 400],
    ['a truncated WAV', () => upload(engineer, a.sharedSurvey.id, good().subarray(0, 20_000)), 400],
    ['8-bit PCM', () => upload(engineer, a.sharedSurvey.id, decayingNoiseWav({ bitDepth: '8' })), 400],
    ['an empty file', () => upload(engineer, a.sharedSurvey.id, new Uint8Array(0)), 400],
    ['no file at all', () => upload(engineer, a.sharedSurvey.id, null), 400],
    ['a file over the limit', () => upload(engineer, a.sharedSurvey.id, decayingNoiseWav({ durationS: 12 })), 413],
    ['an unknown survey', () => upload(engineer, 999_999, good()), 404],
    ["another workspace's survey", () => upload(engineer, b.sharedSurvey.id, good()), 404],
    ['a viewer (read-only)', () => upload(viewer, a.sharedSurvey.id, good()), 403],
    ['an unknown kind', () => upload(engineer, a.sharedSurvey.id, good(), { kind: 'noise' }), 400],
    ['a channel the file lacks', () => upload(engineer, a.sharedSurvey.id, good(), { kind: 'impulse', channel: '3' }), 400],
    ['a sweep without parameters or reference', () => upload(engineer, a.sharedSurvey.id, good(), { kind: 'sweep' }), 400],
  ]
  for (const [label, send, status] of cases) {
    it(`answers ${status} with a clear message for ${label}`, async () => {
      const rowsBefore = await Capture.count()
      const response = await send()
      expect(response.status).toBe(status)
      expect(response.body.error.message.length).toBeGreaterThan(10)
      expect(await Capture.count()).toBe(rowsBefore)
      expect(await storedFiles()).toEqual([])
    })
  }

  it('says what to do for 8-bit PCM', async () => {
    const response = await upload(engineer, a.sharedSurvey.id, decayingNoiseWav({ bitDepth: '8' }))
    expect(response.body.error.message).toMatch(/8-bit/)
    expect(response.body.error.message).toMatch(/16\/24\/32-bit PCM/)
  })
})

describe('POST /api/surveys/:surveyId/captures — a good upload', () => {
  it('stores the file content-addressed, writes the row and queues one analysis job (202)', async () => {
    const bytes = decayingNoiseWav({ bitDepth: '24', sampleRateHz: 44_100 })
    const response = await upload(client, a.sharedSurvey.id, bytes, { kind: 'impulse', sourceLabel: 'Left speaker', receiverLabel: 'Mix position', positionXM: '1.9', positionYM: '1.7', positionZM: '1.2' })
    expect(response.status).toBe(202)
    expect(response.body).toMatchObject({ status: 'queued', sampleRateHz: 44_100, bitDepth: 24, channelCount: 1, sourceLabel: 'Left speaker', positionXM: 1.9 })
    expect(response.body.durationS).toBeCloseTo(1, 6)
    expect(await storedFiles()).toEqual([contentKey(response.body.sha256)])
    expect((await services.store.head(contentKey(response.body.sha256)))?.byteSize).toBe(bytes.length)
    const queue = new Queue(ANALYSIS_QUEUE_NAME, { connection: services.redis, prefix: services.config.QUEUE_PREFIX })
    const jobs = await queue.getJobs(['waiting', 'delayed', 'prioritized'])
    expect(jobs.filter((job) => job.data.captureId === response.body.id)).toHaveLength(1)
    await queue.close()
  })

  it('lists the survey captures and hides them from another workspace', async () => {
    const list = await client.get(`/api/surveys/${a.sharedSurvey.id}/captures`)
    expect(list.status).toBe(200)
    const uploaded = list.body.items.filter((c: { originalName: string }) => c.originalName === 'capture.wav')
    expect(uploaded).toHaveLength(1)
    expect(uploaded[0].headline).toBeNull()
    const outsider = await signedInAgent(ringdown.app, b.users.owner.email, FIXTURE_PASSWORD)
    expect((await outsider.get(`/api/surveys/${a.sharedSurvey.id}/captures`)).status).toBe(404)
    expect((await outsider.get(`/api/captures/${uploaded[0].id}`)).status).toBe(404)
    expect((await outsider.delete(`/api/captures/${uploaded[0].id}`)).status).toBe(404)
    expect((await client.get(`/api/captures/${uploaded[0].id}/analysis`)).body.error.code).toBe('analysis-not-ready')
  })

  it('lets a viewer read but not delete, and the uploader delete, removing the file', async () => {
    const capture = (await client.get(`/api/surveys/${a.sharedSurvey.id}/captures`)).body.items.find((c: { originalName: string }) => c.originalName === 'capture.wav')
    expect((await viewer.get(`/api/captures/${capture.id}`)).status).toBe(200)
    expect((await viewer.delete(`/api/captures/${capture.id}`)).status).toBe(403)
    expect((await client.delete(`/api/captures/${a.sharedCapture.id}`)).status).toBe(403) // uploaded by the engineer
    expect((await client.delete(`/api/captures/${capture.id}`)).status).toBe(204)
    expect(await storedFiles()).toEqual([])
  })
})
