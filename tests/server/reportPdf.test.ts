import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mkdtemp, rm } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { createApp, type RingdownApp } from '../../server/app'
import { Room, type Survey } from '../../server/models'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { addAnalysedCapture, createAnalysedSurvey } from '../helpers/analysedSurveys'
import { pdfText, savePageOneImage, tinyLogoPng } from '../helpers/pdfText'

let services: TestServices
let ringdown: RingdownApp
let storageDir: string
let a: WorkspaceFixture
let owner: ApiAgent
let longRoom: Room
let longBefore: Survey
let longAfter: Survey
let scriptRoom: Room
let scriptBefore: Survey
let scriptAfter: Survey

// 120 characters each, with the distinguishing words at the end so a cut-off name would show.
const LONG_BEFORE = `Before treatment, measured with the doors closed and the ventilation switched off, all six listening positions, first visit`.slice(0, 120)
const LONG_AFTER = `After the bass traps, ceiling cloud and side panels were installed and the desk was moved, all six positions, second visit`.slice(0, 120)
const ROOM_POLISH = 'Łódź Studio Ćwiczeń'
const CLIENT_GREEK = 'Ακουστική Μελέτη Αθηνών'
const SURVEY_CYRILLIC = 'До обработки, Москва'
const SURVEY_JAPANESE = '処理後の録音スタジオ'

const binary = (response: unknown, done: (error: Error | null, body: unknown) => void) => {
  const res = response as NodeJS.ReadableStream
  const chunks: Buffer[] = []
  res.on('data', (chunk: Buffer) => chunks.push(chunk))
  res.on('end', () => done(null, Buffer.concat(chunks)))
}

async function draftPdf(room: Room, surveys: Survey[]): Promise<Buffer> {
  const response = await owner.agent.get(`/api/rooms/${room.id}/report.pdf?surveys=${surveys.map((s) => s.id).join(',')}`).buffer(true).parse(binary)
  expect(response.status).toBe(200)
  return response.body as Buffer
}

beforeAll(async () => {
  storageDir = await mkdtemp(path.join(tmpdir(), 'ringdown-report-pdf-'))
  services = await startTestServices({ STORAGE_DIR: storageDir })
  ringdown = createApp(services)
  a = await createWorkspaceFixture('Pdf')
  owner = await signedInAgent(ringdown.app, a.users.owner.email, FIXTURE_PASSWORD)
  await owner.put(`/api/workspaces/${a.workspace.id}/profile`, { consultancyName: 'Northlight Acoustics', address: '12 Quay Street, Harbourtown', contact: 'studio@northlight.test · +44 20 0000 0000' })
  await owner.agent.put(`/api/workspaces/${a.workspace.id}/profile/logo`).set('x-csrf-token', await owner.refreshCsrf()).set('content-type', 'image/png').send(tinyLogoPng())
  longRoom = await Room.create({ workspaceId: a.workspace.id, name: 'Control room B', clientName: 'Harbour Records', address: '3 Dock Lane', use: 'control-room', lengthM: 5, widthM: 4, heightM: 2.5, volumeM3: null })
  longBefore = await createAnalysedSurvey(longRoom, { name: LONG_BEFORE, t60S: 0.6, positions: 2, store: services.store, seed: 101 })
  longAfter = await createAnalysedSurvey(longRoom, { name: LONG_AFTER, t60S: 0.2, positions: 2, store: services.store, seed: 111 })
  await addAnalysedCapture(longAfter, { t60S: 0.9, seed: 121, store: services.store, label: 'Doorway, a position with a very long label that has to wrap in its table cell' })
  const doorway = (await owner.get(`/api/surveys/${longAfter.id}/captures`)).body.items.find((c: { receiverLabel: string }) => c.receiverLabel.startsWith('Doorway'))
  await owner.put(`/api/captures/${doorway.id}/inclusion`, { isIncluded: false, reason: 'Next to the open door: not a listening position' })
  scriptRoom = await Room.create({ workspaceId: a.workspace.id, name: ROOM_POLISH, clientName: CLIENT_GREEK, address: 'ul. Piotrkowska 1, Łódź', use: 'control-room', lengthM: 5, widthM: 4, heightM: 2.5, volumeM3: null })
  scriptBefore = await createAnalysedSurvey(scriptRoom, { name: SURVEY_CYRILLIC, t60S: 0.6, positions: 2, store: services.store, seed: 131 })
  scriptAfter = await createAnalysedSurvey(scriptRoom, { name: SURVEY_JAPANESE, t60S: 0.2, positions: 2, store: services.store, seed: 141 })
}, 180_000)
afterAll(async () => {
  await ringdown.close()
  await services.close()
  await rm(storageDir, { recursive: true, force: true })
})

describe('PDF report layout', () => {
  it('stands every table header line above its rows for survey names of 120 characters, with client block, positions and σ', async () => {
    const pdf = await draftPdf(longRoom, [longBefore, longAfter])
    savePageOneImage(pdf, 'report-pdf-page-1-long-names')
    const text = pdfText(pdf)
    const lines = text.split('\n')
    // Client block on page 1 (pages are separated by form feeds).
    const pageOne = text.split('\f')[0]!
    for (const expected of ['Northlight Acoustics', '12 Quay Street, Harbourtown', 'CLIENT', 'Harbour Records', 'Control room B', 'DATE AND REVISION', 'Verdict']) expect(pageOne).toContain(expected)
    // Band table: header line with the σ columns, and every band row below it.
    const headerIndex = lines.findIndex((line) => /Band\s+S1 T \(s\)\s+S1 σ \(s\)\s+S2 T \(s\)\s+S2 σ \(s\)/.test(line))
    expect(headerIndex).toBeGreaterThan(-1)
    const bandRows = ['63 Hz', '125 Hz', '250 Hz', '500 Hz', '1 kHz', '2 kHz', '4 kHz', '8 kHz'].map((band) => lines.findIndex((line, i) => i > headerIndex && line.trimStart().startsWith(band)))
    expect(bandRows.every((index) => index > headerIndex)).toBe(true)
    // No header word is printed on a data row (what an overlap looks like in pdftotext).
    for (const index of bandRows) expect(lines[index]).not.toMatch(/S\d T|σ \(s\)|Verdict/)
    // The full names are printed (in the legend), wrapped but complete.
    const flat = text.replace(/\s+/g, ' ')
    expect(flat).toContain(`S1 = ${LONG_BEFORE}`)
    expect(flat).toContain(`S2 = ${LONG_AFTER}`)
    // Positions used and excluded, with the reason, and the appendix.
    expect(flat).toMatch(/2 of 3 positions used/)
    expect(flat).toContain('Reason: Next to the open door')
    expect(flat).toContain('excluded')
    expect(flat).toContain('Appendix: values per position')
    expect(text).toMatch(/Page 1 of \d/)
  })

  it('prints Polish, Greek, Cyrillic and Japanese names unchanged', async () => {
    const pdf = await draftPdf(scriptRoom, [scriptBefore, scriptAfter])
    savePageOneImage(pdf, 'report-pdf-page-1-scripts')
    const text = pdfText(pdf)
    for (const name of [ROOM_POLISH, CLIENT_GREEK, SURVEY_CYRILLIC, SURVEY_JAPANESE, 'ul. Piotrkowska 1, Łódź']) expect(text).toContain(name)
  })
})
