import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mkdtemp, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { createApp, type RingdownApp } from '../../server/app'
import { Room, type Capture, type Survey } from '../../server/models'
import { createSmtpMailer } from '../../server/mail/mailer'
import { readFakeInbox, startFakeSmtpInbox } from '../../server/mail/fakeSmtpInbox'
import { settingsToKey, DEFAULT_ANALYSIS_SETTINGS } from '../../shared/jobs/analysisSettingsKey'
import { OCTAVE_CENTRES_HZ } from '../../shared/room/targets/targetForRoom'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { addAnalysedCapture, analyseInProcess, createAnalysedSurvey, synthesizedRoomWav } from '../helpers/analysedSurveys'
import { pdfText } from '../helpers/pdfText'

let services: TestServices
let ringdown: RingdownApp
let scratch: string
let storageDir: string
let mailDir: string
let inbox: { port: number; close: () => Promise<void> }
let a: WorkspaceFixture
let engineer: ApiAgent
let client: ApiAgent
let viewer: ApiAgent
let room: Room
let before: Survey
let after: Survey
let badPosition: Capture

// A 5 × 4 × 2.5 m control room: V = 50 m³, EBU Tech 3276 Tm = 0.198 s, ±0.05 s from 200 Hz to
// 4 kHz (facts §9; the tolerance shape is from memory — verify). "After" has two positions at
// T60 = 0.2 s and one at 0.9 s: with all three the 1 kHz mean is ≈ 0.43 s (too live), without
// the 0.9 s position ≈ 0.2 s (inside).
beforeAll(async () => {
  scratch = await mkdtemp(path.join(tmpdir(), 'ringdown-revisions-'))
  storageDir = path.join(scratch, 'files')
  mailDir = path.join(scratch, 'mail')
  inbox = await startFakeSmtpInbox({ port: 0, mailDir })
  services = await startTestServices({ STORAGE_DIR: storageDir, PUBLIC_URL: 'http://ringdown.test' })
  ringdown = createApp({ ...services, mailer: createSmtpMailer(`smtp://127.0.0.1:${inbox.port}`, 'Ringdown <no-reply@ringdown.invalid>') })
  a = await createWorkspaceFixture('Rev')
  room = a.sharedRoom
  before = await createAnalysedSurvey(room, { name: 'Bare room', t60S: 0.6, positions: 2, store: services.store, seed: 51 })
  after = await createAnalysedSurvey(room, { name: 'After panels', t60S: 0.2, positions: 2, store: services.store, seed: 61 })
  badPosition = await addAnalysedCapture(after, { t60S: 0.9, seed: 71, store: services.store, label: 'Doorway' })
  engineer = await signedInAgent(ringdown.app, a.users.engineer.email, FIXTURE_PASSWORD)
  client = await signedInAgent(ringdown.app, a.users.client.email, FIXTURE_PASSWORD)
  viewer = await signedInAgent(ringdown.app, a.users.viewer.email, FIXTURE_PASSWORD)
}, 180_000)
afterAll(async () => {
  await ringdown.close()
  await inbox.close()
  await services.close()
  await rm(scratch, { recursive: true, force: true })
})

const binary = (response: unknown, done: (error: Error | null, body: unknown) => void) => {
  const res = response as NodeJS.ReadableStream
  const chunks: Buffer[] = []
  res.on('data', (chunk: Buffer) => chunks.push(chunk))
  res.on('end', () => done(null, Buffer.concat(chunks)))
}
type Verdicts = { surveys: { verdicts: { centreHz: number; verdict: string }[] }[] }
const verdictAt = (body: Verdicts, surveyIndex: number, hz: number) => body.surveys[surveyIndex]!.verdicts.find((v) => v.centreHz === hz)?.verdict
const comparison = (agent: ApiAgent, bands = 'octave') => agent.get(`/api/rooms/${room.id}/comparison?surveys=${before.id},${after.id}&bands=${bands}`)

async function uploadAs(agent: ApiAgent, surveyId: number, bytes: Uint8Array, label: string) {
  const token = await agent.refreshCsrf()
  return agent.agent.post(`/api/surveys/${surveyId}/captures`).set('x-csrf-token', token).field('kind', 'impulse').field('receiverLabel', label).attach('file', Buffer.from(bytes), `${label}.wav`)
}

describe('verdicts without analyses in the band resolution', () => {
  it('says "not analysed", never "not reliable", for a third-octave comparison with no third-octave analyses', async () => {
    const response = await comparison(engineer, 'third')
    expect(response.status).toBe(200)
    const verdicts = response.body.surveys.flatMap((s: Verdicts['surveys'][number]) => s.verdicts.map((v) => v.verdict))
    expect(verdicts).toContain('not-analysed')
    expect(verdicts).not.toContain('not-reliable')
    expect(response.body.summaryLine).toBe('After panels: not analysed in third-octave bands yet, so no band was judged.')
    expect(response.body.reportBlockers.join(' ')).toContain('0 of 3 positions are analysed in third-octave bands')
  })

  it('refuses to send a report that is not analysed in its bands (409, nothing frozen)', async () => {
    const sent = await engineer.post(`/api/rooms/${room.id}/reports`, { surveyIds: [before.id, after.id], bands: 'third', recipientEmail: 'client@example.test' })
    expect(sent.status).toBe(409)
    expect(sent.body.error.message).toContain('analyse the whole survey in third-octave bands first')
    expect((await engineer.get(`/api/rooms/${room.id}/report-revisions`)).body).toEqual([])
  })
})

describe('including and excluding positions', () => {
  it('lets neither a client nor a viewer exclude a position (403)', async () => {
    for (const agent of [client, viewer]) {
      const response = await agent.put(`/api/captures/${badPosition.id}/inclusion`, { isIncluded: false, reason: 'Not a listening position' })
      expect(response.status).toBe(403)
    }
  })

  it('asks for a reason when a position is left out (400)', async () => {
    const response = await engineer.put(`/api/captures/${badPosition.id}/inclusion`, { isIncluded: false, reason: '' })
    expect(response.status).toBe(400)
    expect(response.body.error.fields.reason).toMatch(/reason/)
  })

  it('changes the average, the verdict and the exports when a position is excluded, and logs it', async () => {
    const withAll = await comparison(engineer)
    expect(verdictAt(withAll.body, 1, 1000)).toBe('too-live')
    const csvBefore = (await engineer.get(`/api/surveys/${after.id}/export?format=csv`)).text
    const excluded = await engineer.put(`/api/captures/${badPosition.id}/inclusion`, { isIncluded: false, reason: 'Next to the open door' })
    expect(excluded.status).toBe(200)
    expect(excluded.body).toMatchObject({ isExcluded: true, exclusionReason: 'Next to the open door' })

    const without = await comparison(engineer)
    expect(verdictAt(without.body, 1, 1000)).toBe('inside')
    const summary = without.body.surveys[1].summary
    expect(summary).toMatchObject({ captureCount: 3, includedCount: 2, excludedCount: 1, analysedCount: 2 })
    expect(summary.positions.find((p: { captureId: number }) => p.captureId === badPosition.id)).toMatchObject({ isIncluded: false, exclusionReason: 'Next to the open door' })
    const at1k = summary.bands.find((b: { centreHz: number }) => b.centreHz === 1000)
    expect(at1k.parameters.T30.count).toBe(2)
    expect(Math.abs(at1k.parameters.T30.mean / 0.2 - 1)).toBeLessThan(0.1)

    const csvAfter = (await engineer.get(`/api/surveys/${after.id}/export?format=csv`)).text
    expect(csvAfter).not.toBe(csvBefore)
    const row1k = csvAfter.split('\r\n').find((line) => line.startsWith('1000,'))!
    expect(row1k.split(',').at(-1)).not.toContain(String(badPosition.id))
    const exported = (await engineer.get(`/api/rooms/${room.id}/comparison/export?surveys=${before.id},${after.id}&format=json`)).body
    expect(verdictAt(exported, 1, 1000)).toBe('inside')

    const activity = (await engineer.get(`/api/rooms/${room.id}/activity`)).body as { action: string; summary: string }[]
    expect(activity.find((entry) => entry.action === 'capture.excluded')?.summary).toBe('excluded Doorway from the average of “After panels”: Next to the open door')
    const listed = (await viewer.get(`/api/surveys/${after.id}/captures`)).body.items.find((c: { id: number }) => c.id === badPosition.id)
    expect(listed).toMatchObject({ isExcluded: true, exclusionReason: 'Next to the open door' })
  })
})

describe('analyses: who may start them and which one counts', () => {
  it('refuses a client re-analysis, re-pin or whole-survey analysis (403) but accepts the client’s upload (202)', async () => {
    const settings = { ...DEFAULT_ANALYSIS_SETTINGS, gateMs: 5 }
    expect((await client.post(`/api/captures/${badPosition.id}/analyses`, settings)).status).toBe(403)
    expect((await client.put(`/api/captures/${badPosition.id}/pinned-analysis`, { analysisId: null })).status).toBe(403)
    const { channel: _channel, ...surveySettings } = settings
    expect((await client.post(`/api/surveys/${after.id}/analyses`, surveySettings)).status).toBe(403)
    const uploaded = await uploadAs(client, before.id, synthesizedRoomWav({ t60S: 0.6, seed: 81 }), 'Client sofa')
    expect(uploaded.status).toBe(202)
    await analyseInProcess(uploaded.body.id, services.store, settingsToKey({ ...DEFAULT_ANALYSIS_SETTINGS, channel: 0 }))
  })

  it('keeps the capture page and export on the pinned analysis after a re-analysis, until it is re-pinned', async () => {
    const capture = (await engineer.get(`/api/surveys/${before.id}/captures`)).body.items[0] as { id: number }
    const first = (await engineer.get(`/api/captures/${capture.id}/analysis`)).body
    expect(first).toMatchObject({ isCounting: true, isPinned: false })
    const settings = { ...DEFAULT_ANALYSIS_SETTINGS, smoothing: 12 as const }
    expect((await engineer.post(`/api/captures/${capture.id}/analyses`, settings)).status).toBe(202)
    await analyseInProcess(capture.id, services.store, settingsToKey(settings))
    const list = (await engineer.get(`/api/captures/${capture.id}/analyses`)).body as { id: number; isCounting: boolean }[]
    expect(list).toHaveLength(2)
    const newer = list.find((item) => item.id !== first.id)!
    expect((await engineer.get(`/api/captures/${capture.id}/analysis`)).body.id).toBe(first.id)
    expect((await engineer.get(`/api/captures/${capture.id}/export?format=json`)).body.id).toBe(first.id)
    expect((await engineer.get(`/api/captures/${capture.id}/export?format=json&analysisId=${newer.id}`)).body.id).toBe(newer.id)
    const pinned = await engineer.put(`/api/captures/${capture.id}/pinned-analysis`, { analysisId: newer.id })
    expect(pinned.status).toBe(200)
    expect(pinned.body).toMatchObject({ pinnedAnalysisId: newer.id, countingAnalysisId: newer.id })
    expect((await viewer.get(`/api/captures/${capture.id}/analysis`)).body).toMatchObject({ id: newer.id, isPinned: true, isCounting: true })
    expect((await engineer.put(`/api/captures/${capture.id}/pinned-analysis`, { analysisId: 999_999 })).status).toBe(400)
    await engineer.put(`/api/captures/${capture.id}/pinned-analysis`, { analysisId: null })
    expect((await engineer.get(`/api/captures/${capture.id}/analysis`)).body.id).toBe(first.id)
  })
})

describe('sent reports are frozen revisions', () => {
  it('returns the same verdict and the same PDF text after a new upload and a re-analysis in its surveys', async () => {
    const sent = await engineer.post(`/api/rooms/${room.id}/reports`, { surveyIds: [before.id, after.id], recipientEmail: 'client@example.test' })
    expect(sent.status).toBe(201)
    expect(sent.body.revisionNumber).toBe(1)
    const mail = (await readFakeInbox(mailDir)).find((m) => m.to.includes('client@example.test'))!
    expect(mail.text).toContain('revision 1 of')
    const token = mail.text.match(/http:\/\/ringdown\.test\/shared\/([A-Za-z0-9_-]+)/)![1]!
    const sharedBefore = (await request(ringdown.app).get(`/api/shared/${token}`)).body
    expect(sharedBefore.revision.number).toBe(1)
    expect(verdictAt(sharedBefore, 1, 1000)).toBe('inside')
    const pdfBefore = pdfText((await request(ringdown.app).get(`/api/shared/${token}/report.pdf`).buffer(true).parse(binary)).body as Buffer)
    const [revision] = (await engineer.get(`/api/rooms/${room.id}/report-revisions`)).body
    expect(revision).toMatchObject({ number: 1, status: 'sent', recipients: [expect.objectContaining({ email: 'client@example.test' })] })

    // A client uploads a bad position into "After", an engineer re-analyses another capture.
    const uploaded = await uploadAs(client, after.id, synthesizedRoomWav({ t60S: 0.9, seed: 91 }), 'Client corner')
    expect(uploaded.status).toBe(202)
    await analyseInProcess(uploaded.body.id, services.store, settingsToKey({ ...DEFAULT_ANALYSIS_SETTINGS, channel: 0 }))
    const someCapture = (await engineer.get(`/api/surveys/${after.id}/captures`)).body.items[0] as { id: number }
    const third = { ...DEFAULT_ANALYSIS_SETTINGS, bands: 'third' as const }
    expect((await engineer.post(`/api/captures/${someCapture.id}/analyses`, third)).status).toBe(202)
    await analyseInProcess(someCapture.id, services.store, settingsToKey(third))

    expect(verdictAt((await comparison(engineer)).body, 1, 1000)).toBe('too-live')
    const sharedAfter = (await request(ringdown.app).get(`/api/shared/${token}`)).body
    expect(sharedAfter.surveys.map((s: Verdicts['surveys'][number]) => s.verdicts)).toEqual(sharedBefore.surveys.map((s: Verdicts['surveys'][number]) => s.verdicts))
    expect(sharedAfter.summaryLine).toBe(sharedBefore.summaryLine)
    const pdfAfter = pdfText((await request(ringdown.app).get(`/api/shared/${token}/report.pdf`).buffer(true).parse(binary)).body as Buffer)
    expect(pdfAfter).toBe(pdfBefore)
    const revisionPdf = await engineer.agent.get(`/api/rooms/${room.id}/report-revisions/${revision.id}/report.pdf`).buffer(true).parse(binary)
    expect(pdfText(revisionPdf.body as Buffer)).toBe(pdfBefore)
    expect((await engineer.get(`/api/rooms/${room.id}/report-revisions/${revision.id}`)).body.snapshot.comparison.summaryLine).toBe(sharedBefore.summaryLine)

    const revisions = (await engineer.get(`/api/rooms/${room.id}/report-revisions`)).body as { number: number; status: string; changeNotes: string[] }[]
    expect(revisions.map((r) => [r.number, r.status])).toEqual([[2, 'draft'], [1, 'sent']])
    expect(revisions[0]!.changeNotes.join(' ')).toMatch(/New capture Client corner uploaded.*re-analysed/)
    // The client sees the sent revision only.
    expect((await client.get(`/api/rooms/${room.id}/report-revisions`)).body.map((r: { number: number }) => r.number)).toEqual([1])
  })

  it('reuses the revision when nothing changed, and freezes the draft when something did', async () => {
    const again = await engineer.post(`/api/rooms/${room.id}/share-links`, { surveyIds: [before.id, after.id], bands: 'octave' })
    expect(again.status).toBe(201)
    expect(again.body.revisionNumber).toBe(2)
    const once = await engineer.post(`/api/rooms/${room.id}/share-links`, { surveyIds: [before.id, after.id], bands: 'octave' })
    expect(once.body.revisionNumber).toBe(2)
    const revisions = (await engineer.get(`/api/rooms/${room.id}/report-revisions`)).body as { number: number; status: string }[]
    expect(revisions.map((r) => [r.number, r.status])).toEqual([[2, 'sent'], [1, 'sent']])
  })
})

describe('room targets', () => {
  const limits = OCTAVE_CENTRES_HZ.map((centreHz) => ({ centreHz, minS: 0.3, maxS: 0.8 }))

  it('refuses a custom target without a source note (400) and from a client (403)', async () => {
    const missing = await engineer.post(`/api/workspaces/${a.workspace.id}/custom-targets`, { name: 'Vocal booth brief', sourceNote: '', octaveLimits: limits })
    expect(missing.status).toBe(400)
    expect(missing.body.error.fields.sourceNote).toMatch(/where the limits come from/)
    expect((await client.post(`/api/workspaces/${a.workspace.id}/custom-targets`, { name: 'X', sourceNote: 'Client brief', octaveLimits: limits })).status).toBe(403)
  })

  it('judges the room by its chosen custom target, shows it on the room and logs the change', async () => {
    const created = await engineer.post(`/api/workspaces/${a.workspace.id}/custom-targets`, { name: 'Live room brief', sourceNote: 'Client brief of 3 March, section 2', octaveLimits: limits })
    expect(created.status).toBe(201)
    expect((await engineer.put(`/api/rooms/${room.id}/target`, { targetProfile: 'custom:999999' })).status).toBe(400)
    const changed = await engineer.put(`/api/rooms/${room.id}/target`, { targetProfile: `custom:${created.body.id}` })
    expect(changed.status).toBe(200)
    expect(changed.body.target).toMatchObject({ kind: 'custom', name: 'Live room brief', citationText: 'Custom target of this workspace; source: Client brief of 3 March, section 2' })
    const judged = (await comparison(viewer)).body
    expect(judged.target.id).toBe(`custom:${created.body.id}`)
    expect(verdictAt(judged, 0, 1000)).toBe('inside')
    const activity = (await engineer.get(`/api/rooms/${room.id}/activity`)).body as { action: string; summary: string }[]
    expect(activity.find((entry) => entry.action === 'room.target-changed')?.summary).toBe('changed the target from “Reference listening room (EBU Tech 3276 / ITU-R BS.1116)” to “Live room brief”')
    expect((await engineer.delete(`/api/workspaces/${a.workspace.id}/custom-targets/${created.body.id}`)).status).toBe(409)
    expect((await client.put(`/api/rooms/${room.id}/target`, { targetProfile: 'auto' })).status).toBe(403)
  })
})

describe('what a client sees', () => {
  // Internal provenance markers belong in tests and reference notes only (project rule).
  const INTERNAL = /from memory|project facts|facts §|§\s?\d|verify against|as transcribed/i

  it('contains no internal provenance wording in screens’ data, exports, PDFs or e-mails', async () => {
    await engineer.put(`/api/rooms/${room.id}/target`, { targetProfile: 'auto' })
    const outputs: string[] = []
    const json = async (agent: ApiAgent, url: string) => outputs.push(JSON.stringify((await agent.get(url)).body))
    for (const bands of ['octave', 'third']) {
      await json(client, `/api/rooms/${room.id}/comparison?surveys=${before.id},${after.id}&bands=${bands}`)
      await json(client, `/api/surveys/${after.id}/summary?bands=${bands}`)
      outputs.push((await client.get(`/api/rooms/${room.id}/comparison/export?surveys=${before.id},${after.id}&format=csv&bands=${bands}`)).text)
    }
    await json(client, `/api/rooms/${room.id}`)
    await json(client, `/api/workspaces/${a.workspace.id}/materials`)
    await json(engineer, `/api/workspaces/${a.workspace.id}/target-options`)
    for (const targetProfile of ['ebu-tech-3276', 'din-18041-a1', 'din-18041-a3', 'ansi-s12-60', 'small-studio-common-practice']) {
      await engineer.put(`/api/rooms/${room.id}/target`, { targetProfile })
      await json(client, `/api/rooms/${room.id}/comparison?surveys=${before.id},${after.id}`)
      outputs.push(pdfText((await engineer.agent.get(`/api/rooms/${room.id}/report.pdf?surveys=${before.id},${after.id}`).buffer(true).parse(binary)).body as Buffer))
    }
    const sent = await engineer.post(`/api/rooms/${room.id}/reports`, { surveyIds: [before.id, after.id], recipientEmail: 'second@example.test' })
    const token = sent.body.url.split('/').at(-1)
    outputs.push(JSON.stringify((await request(ringdown.app).get(`/api/shared/${token}`)).body))
    outputs.push(pdfText((await request(ringdown.app).get(`/api/shared/${token}/report.pdf`).buffer(true).parse(binary)).body as Buffer))
    for (const mail of await readFakeInbox(mailDir)) outputs.push(`${mail.subject}\n${mail.text}`)
    expect(outputs.length).toBeGreaterThan(15)
    for (const output of outputs) expect(output).not.toMatch(INTERNAL)
  })
})

describe('analysing the whole survey with other settings', () => {
  it('queues every capture once through the re-analysis service, reports progress, and then judges the third octaves', async () => {
    const settings = { bands: 'third', smoothing: 6, gateMs: null, timeReversedFiltering: true }
    const run = await engineer.post(`/api/surveys/${before.id}/analyses`, settings)
    expect(run.status).toBe(202)
    expect(run.body).toMatchObject({ total: 3, queued: 3, alreadyAnalysed: 0 })
    expect((await engineer.get(`/api/surveys/${before.id}/analysis-progress`)).body).toMatchObject({ total: 3, done: 0, pending: 3, failed: 0 })
    const captures = (await engineer.get(`/api/surveys/${before.id}/captures`)).body.items as { id: number }[]
    for (const capture of captures) await analyseInProcess(capture.id, services.store, settingsToKey({ ...(settings as typeof DEFAULT_ANALYSIS_SETTINGS), channel: 0 }))
    expect((await engineer.get(`/api/surveys/${before.id}/analysis-progress`)).body).toMatchObject({ total: 3, done: 3, pending: 0 })
    expect((await engineer.post(`/api/surveys/${before.id}/analyses`, settings)).body).toMatchObject({ queued: 0, alreadyAnalysed: 3 })
    const summary = (await engineer.get(`/api/surveys/${before.id}/summary?bands=third`)).body
    expect(summary.analysedCount).toBe(3)
    expect(summary.analysisSettings.bands).toBe('third')
    expect(summary.readings.find((r: { centreHz: number }) => r.centreHz === 1000).isAnalysed).toBe(true)
    const activity = (await engineer.get(`/api/rooms/${room.id}/activity`)).body as { action: string; summary: string }[]
    expect(activity.find((entry) => entry.action === 'survey.analysed')?.summary).toMatch(/^analysed the whole survey “Bare room” with third-octave bands/)
    expect((await engineer.post(`/api/surveys/${before.id}/analyses`, { ...settings, smoothing: 5 })).status).toBe(400)
  })
})
