import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createApp, type RingdownApp } from '../../server/app'
import { Analysis, Capture } from '../../server/models'
import { settingsToKey, DEFAULT_ANALYSIS_SETTINGS } from '../../shared/jobs/analysisSettingsKey'
import type { AnalysisResult } from '../../shared/types/analysis'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'

let services: TestServices
let ringdown: RingdownApp
let fixture: WorkspaceFixture
let outsiderFixture: WorkspaceFixture
let viewer: ApiAgent

/** A capture row with one done analysis carrying these headline figures (and a large result). */
async function analysedCapture(receiverLabel: string, t30S: number | null, c80Db: number | null): Promise<Capture> {
  const capture = await Capture.create({
    surveyId: fixture.privateSurvey.id, uploadedById: null, kind: 'impulse', receiverLabel, positionXM: null, positionYM: null, positionZM: null,
    sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256: null, originalName: `${receiverLabel}.wav`, sha256: 'a'.repeat(64),
    byteSize: 1, sampleRateHz: 48_000, bitDepth: 24, channelCount: 1, durationS: 1,
  })
  const settings = DEFAULT_ANALYSIS_SETTINGS
  // A bulky stand-in result: the list must never read it.
  const result = { padding: 'x'.repeat(200_000) } as unknown as AnalysisResult
  await Analysis.create({
    captureId: capture.id, settingsKey: settingsToKey(settings), settings, status: 'done', result, engineVersion: 'test',
    headlineT30S: t30S, headlineC80Db: c80Db, finishedAt: new Date(), enqueuedAt: new Date(),
  })
  return capture
}

async function waitingCapture(receiverLabel: string): Promise<Capture> {
  const capture = await analysedCapture(receiverLabel, null, null)
  await Analysis.update({ status: 'queued', result: null, finishedAt: null }, { where: { captureId: capture.id } })
  return capture
}

beforeAll(async () => {
  services = await startTestServices()
  ringdown = createApp(services)
  fixture = await createWorkspaceFixture('Mu')
  outsiderFixture = await createWorkspaceFixture('Nu')
  // The private room is readable by the owner and engineer; sign in the owner as "viewer" of the list.
  viewer = await signedInAgent(ringdown.app, fixture.users.owner.email, FIXTURE_PASSWORD)
  await analysedCapture('Mix position', 0.42, 1.5)
  await analysedCapture('Couch', 0.61, -0.5)
  await waitingCapture('Door')
  await analysedCapture('Desk', 0.35, 3.0)
  await analysedCapture('Back wall', null, null)
})
afterAll(async () => {
  await ringdown.close()
  await services.close()
})

const labels = (body: { items: { receiverLabel: string }[] }) => body.items.map((item) => item.receiverLabel)

describe('GET /api/surveys/:surveyId/captures — paging and sorting on the server', () => {
  it('answers a page in upload order with the total, each with its derived state and headline', async () => {
    const response = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?page=1&pageSize=2`)
    expect(response.status).toBe(200)
    expect(response.body).toMatchObject({ total: 5, page: 1, pageSize: 2 })
    expect(labels(response.body)).toEqual(['Mix position', 'Couch'])
    expect(response.body.items[0]).toMatchObject({ status: 'done', headline: { T30S: 0.42, C80Db: 1.5 } })
    const last = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?page=3&pageSize=2`)
    expect(labels(last.body)).toEqual(['Back wall'])
    const beyond = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?page=9&pageSize=2`)
    expect(beyond.body).toMatchObject({ items: [], total: 5 })
  })

  it('sorts by a headline figure with captures without one last, in both directions', async () => {
    const ascending = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?sort=T30&order=asc`)
    expect(labels(ascending.body)).toEqual(['Desk', 'Mix position', 'Couch', 'Door', 'Back wall'])
    const descending = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?sort=T30&order=desc`)
    expect(labels(descending.body)).toEqual(['Couch', 'Mix position', 'Desk', 'Door', 'Back wall'])
    const byC80 = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?sort=C80&order=desc&pageSize=1`)
    expect(labels(byC80.body)).toEqual(['Desk'])
    const byReceiver = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?sort=receiver`)
    expect(labels(byReceiver.body)).toEqual(['Back wall', 'Couch', 'Desk', 'Door', 'Mix position'])
  })

  it('filters to captures with (or without) a finished analysis', async () => {
    const analysed = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?analysed=true`)
    expect(analysed.body.total).toBe(4)
    const waiting = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?analysed=false`)
    expect(labels(waiting.body)).toEqual(['Door'])
    expect(waiting.body.items[0]).toMatchObject({ status: 'queued', headline: null })
  })

  it('never reads an analysis result to build the list', async () => {
    const queries: string[] = []
    // Sequelize reads `options.logging` on every query; swapping it records the SQL of one request.
    const options = (services.sequelize as unknown as { options: { logging: unknown } }).options
    const previous = options.logging
    options.logging = (query: string) => queries.push(query)
    try {
      const response = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?sort=EDT`)
      expect(response.status).toBe(200)
      expect(JSON.stringify(response.body).length).toBeLessThan(20_000)
    } finally {
      options.logging = previous
    }
    const analysisQueries = queries.filter((query) => /analyses/.test(query))
    expect(analysisQueries.length).toBeGreaterThan(0)
    for (const query of analysisQueries) expect(query).not.toMatch(/"result"|\.result\b|\bresult,|SELECT \*/)
  })

  it('answers 400 with a message for bad paging or sorting, and 404 to another workspace', async () => {
    for (const query of ['page=0', 'pageSize=500', 'sort=colour', 'order=up', 'analysed=maybe']) {
      const response = await viewer.get(`/api/surveys/${fixture.privateSurvey.id}/captures?${query}`)
      expect(response.status, query).toBe(400)
      expect(response.body.error.message.length).toBeGreaterThan(10)
    }
    const outsider = await signedInAgent(ringdown.app, outsiderFixture.users.owner.email, FIXTURE_PASSWORD)
    expect((await outsider.get(`/api/surveys/${fixture.privateSurvey.id}/captures`)).status).toBe(404)
  })
})
