import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { execFileSync } from 'node:child_process'
import { mkdtemp, rm, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { createApp, type RingdownApp } from '../../server/app'
import type { Survey } from '../../server/models'
import { createSmtpMailer } from '../../server/mail/mailer'
import { readFakeInbox, startFakeSmtpInbox } from '../../server/mail/fakeSmtpInbox'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { signedInAgent, type ApiAgent } from '../helpers/apiAgent'
import { createWorkspaceFixture, FIXTURE_PASSWORD, type WorkspaceFixture } from '../helpers/workspaceFixture'
import { createAnalysedSurvey } from '../helpers/analysedSurveys'

let services: TestServices
let ringdown: RingdownApp
let scratch: string
let inbox: { port: number; close: () => Promise<void> }
let a: WorkspaceFixture
let engineer: ApiAgent
let before: Survey
let after: Survey

beforeAll(async () => {
  scratch = await mkdtemp(path.join(tmpdir(), 'ringdown-reports-'))
  inbox = await startFakeSmtpInbox({ port: 0, mailDir: path.join(scratch, 'mail') })
  services = await startTestServices({ PUBLIC_URL: 'http://ringdown.test' })
  ringdown = createApp({ ...services, mailer: createSmtpMailer(`smtp://127.0.0.1:${inbox.port}`, 'Ringdown <no-reply@ringdown.invalid>') })
  a = await createWorkspaceFixture('Nu')
  before = await createAnalysedSurvey(a.sharedRoom, { name: 'Bare room', t60S: 0.6, positions: 2, store: services.store, seed: 21 })
  after = await createAnalysedSurvey(a.sharedRoom, { name: 'After panels', t60S: 0.2, positions: 2, store: services.store, seed: 31 })
  engineer = await signedInAgent(ringdown.app, a.users.engineer.email, FIXTURE_PASSWORD)
}, 120_000)
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

/** Text of a PDF by Debian's pdftotext (poppler-utils), layout kept so table rows stay on one line. */
async function pdfText(pdf: Buffer): Promise<string> {
  const file = path.join(scratch, `report-${Date.now()}.pdf`)
  await writeFile(file, pdf)
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' })
}

describe('PDF report of a comparison', () => {
  it('contains the band table, the target, the verdict, the method notes and the cautions', async () => {
    const response = await engineer.agent.get(`/api/rooms/${a.sharedRoom.id}/report.pdf?surveys=${before.id},${after.id}`).buffer(true).parse(binary)
    expect(response.status).toBe(200)
    expect(response.headers['content-type']).toBe('application/pdf')
    const text = await pdfText(response.body as Buffer)
    expect(text).toContain('Acoustic measurement report')
    expect(text).toContain('Nu shared room')
    expect(text).toContain('Draft preview, not sent')
    expect(text).toMatch(/S1 = Bare room \(before\)/)
    expect(text).toMatch(/S1 T \(s\)\s+S1 σ \(s\)\s+S2 T \(s\)\s+S2 σ \(s\)/)
    expect(text).toMatch(/1 kHz\s+0\.\d\d\s+0\.\d{3}\s+0\.\d\d\s+0\.\d{3}\s+-0\.\d\d\s+0\.\d\d–0\.\d\d\s+inside target/)
    expect(text).toContain('EBU Tech 3276')
    expect(text).toContain('T30 −5 to −35 dB')
    expect(text).toContain('fire ratings')
  })

  it('is mailed to the client as a link that works signed out until revoked', async () => {
    const sent = await engineer.post(`/api/rooms/${a.sharedRoom.id}/reports`, { surveyIds: [before.id, after.id], recipientEmail: 'client@example.test' })
    expect(sent.status).toBe(201)
    const mail = (await readFakeInbox(path.join(scratch, 'mail'))).find((m) => m.to.includes('client@example.test'))
    expect(mail?.subject).toBe('Your acoustic report for Nu shared room is ready')
    const token = mail!.text.match(/http:\/\/ringdown\.test\/shared\/([A-Za-z0-9_-]+)/)![1]
    const pdf = await request(ringdown.app).get(`/api/shared/${token}/report.pdf`).buffer(true).parse(binary)
    expect(pdf.status).toBe(200)
    expect(await pdfText(pdf.body as Buffer)).toContain('inside target')
    await engineer.delete(`/api/rooms/${a.sharedRoom.id}/share-links/${sent.body.id}`)
    expect((await request(ringdown.app).get(`/api/shared/${token}/report.pdf`)).status).toBe(410)
  })
})
