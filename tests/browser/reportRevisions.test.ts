import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import path from 'node:path'
import type { Browser, Page } from 'playwright-core'
import { signInThroughPage } from '../helpers/signIn'
import { launchChromium, screenshotPath } from '../helpers/browser'
import { startRunningApp, type RunningApp } from '../helpers/runningApp'
import { DEMO_ACCOUNTS } from '../../server/db/demoData'
import { Analysis, Capture, Room, Survey } from '../../server/models'
import { createSmtpMailer } from '../../server/mail/mailer'
import { readFakeInbox, startFakeSmtpInbox } from '../../server/mail/fakeSmtpInbox'
import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'

let running: RunningApp
let browser: Browser
let page: Page
let room: Room
let surveys: Survey[]
let inbox: { port: number; close: () => Promise<void> }
const mailDir = mkdtempSync(path.join(tmpdir(), 'ringdown-browser-mail-'))

beforeAll(async () => {
  inbox = await startFakeSmtpInbox({ port: 0, mailDir })
  running = await startRunningApp({ withWorker: true, mailer: createSmtpMailer(`smtp://127.0.0.1:${inbox.port}`, 'Ringdown <no-reply@ringdown.invalid>') })
  browser = await launchChromium()
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } })
  room = (await Room.findOne({ where: { name: 'Garden studio control room' } }))!
  surveys = await Survey.findAll({ where: { roomId: room.id }, order: [['measuredOn', 'ASC']] })
  await signInThroughPage(page, running.baseUrl, DEMO_ACCOUNTS[0]!.email)
})
afterAll(async () => {
  await browser?.close()
  await running?.stop()
  await inbox?.close()
})

/** Waits until the worker has analysed every demo capture (a report is refused before). */
async function waitForAnalyses(): Promise<void> {
  await expect.poll(async () => Analysis.count({ where: { status: ['queued', 'analysing'] } }), { timeout: 120_000, interval: 500 }).toBe(0)
}

describe('a sent report stays as it was sent', () => {
  it('chooses a custom target, excludes a position, sends the report, and lists the sent revision unchanged and a new draft after an upload', async () => {
    await page.goto(`${running.baseUrl}/rooms/${room.id}`)
    await page.getByTestId('room-target').waitFor()

    // 1. A custom target defined on the room page and chosen for the room.
    await page.getByTestId('new-custom-target').click()
    await page.getByTestId('custom-target-name').locator('input').fill('Client brief: tracking room')
    await page.getByTestId('custom-target-source').locator('input').fill('Client brief of 2 March, section 4')
    for (const hz of [63, 125, 250, 500, 1000, 2000, 4000, 8000]) {
      await page.getByTestId(`custom-target-min-${hz}`).locator('input').fill('0.1')
      await page.getByTestId(`custom-target-max-${hz}`).locator('input').fill(hz <= 125 ? '0.9' : '0.6')
    }
    await page.getByTestId('custom-target-save').click()
    await expect.poll(() => page.getByTestId('room-target-name').textContent(), { timeout: 15_000 }).toBe('Client brief: tracking room')
    expect(await page.getByTestId('room-target').textContent()).toContain('Client brief of 2 March, section 4')
    await page.screenshot({ path: screenshotPath('40-room-custom-target'), fullPage: true })

    // 2. One position of "after" left out of the average, with a reason.
    await waitForAnalyses()
    const after = surveys[surveys.length - 1]!
    await page.goto(`${running.baseUrl}/rooms/${room.id}/surveys/${after.id}`)
    const first = (await Capture.findOne({ where: { surveyId: after.id }, order: [['id', 'ASC']] }))!
    await page.getByTestId(`capture-exclude-${first.id}`).click()
    await page.getByTestId('exclude-reason').locator('input').fill('Microphone too close to the rear wall')
    await page.getByTestId('exclude-confirm').click()
    await expect.poll(() => page.getByTestId(`capture-inclusion-${first.id}`).getAttribute('data-excluded'), { timeout: 15_000 }).toBe('yes')
    expect(await page.getByTestId(`capture-inclusion-${first.id}`).textContent()).toContain('Microphone too close to the rear wall')
    await page.screenshot({ path: screenshotPath('41-survey-position-excluded'), fullPage: true })

    // 3. The report sent: revision 1, frozen.
    await page.goto(`${running.baseUrl}/rooms/${room.id}`)
    await page.getByTestId('send-report').click()
    await page.getByTestId('send-report-email').locator('input').fill('client@example.test')
    await page.getByTestId('send-report-submit').click()
    await expect.poll(() => page.getByTestId('send-report-sent').textContent(), { timeout: 30_000 }).toContain('as revision 1')
    await page.keyboard.press('Escape')
    const sentRevision = page.getByTestId('revision-1')
    await expect.poll(() => sentRevision.getAttribute('data-status'), { timeout: 15_000 }).toBe('sent')
    const sentSummary = (await page.getByTestId('revision-1-summary').textContent())!
    expect(sentSummary).toMatch(/judged octave bands inside the target/)
    await page.screenshot({ path: screenshotPath('42-room-revision-sent'), fullPage: true })

    // 4. Another capture uploaded into "after" and analysed.
    await page.goto(`${running.baseUrl}/rooms/${room.id}/surveys/${after.id}`)
    const before = await Capture.count({ where: { surveyId: after.id } })
    await expect.poll(() => page.getByTestId('captures-table').locator('tbody tr').count(), { timeout: 15_000 }).toBe(before)
    await page.getByTestId('capture-file-input').setInputFiles(path.resolve('samples/small-room-ir.wav'))
    await page.getByTestId('upload-all').click()
    const rows = page.getByTestId('captures-table').locator('tbody tr')
    await expect.poll(() => rows.count(), { timeout: 30_000 }).toBe(before + 1)
    await waitForAnalyses()

    // 5. The room lists a new draft revision; the sent one is unchanged.
    await page.goto(`${running.baseUrl}/rooms/${room.id}`)
    const draft = page.getByTestId('revision-2')
    await draft.waitFor({ timeout: 15_000 })
    expect(await draft.getAttribute('data-status')).toBe('draft')
    expect(await draft.textContent()).toMatch(/New capture .* uploaded/)
    expect(await page.getByTestId('revision-1').getAttribute('data-status')).toBe('sent')
    expect(await page.getByTestId('revision-1-summary').textContent()).toBe(sentSummary)
    await page.getByTestId('report-revisions').scrollIntoViewIfNeeded()
    await page.screenshot({ path: screenshotPath('43-room-draft-after-upload'), fullPage: true })
  })

  it('shows no internal provenance wording on the room, survey, capture, compare, room model and shared pages', async () => {
    // Internal provenance markers belong in tests and reference notes only (project rule).
    const INTERNAL = /from memory|project facts|facts §|§\s?\d|verify against|as transcribed/i
    const capture = (await Capture.findOne({ where: { surveyId: surveys[1]!.id }, order: [['id', 'ASC']] }))!
    const mail = (await readFakeInbox(mailDir)).find((m) => m.to.includes('client@example.test'))!
    const sharedPath = new URL(mail.text.match(/https?:\/\/\S+\/shared\/[A-Za-z0-9_-]+/)![0]).pathname
    const pages = [
      `/rooms/${room.id}`,
      `/rooms/${room.id}/surveys/${surveys[1]!.id}`,
      `/captures/${capture.id}`,
      `/rooms/${room.id}/compare?surveys=${surveys.map((s) => s.id).join(',')}&bands=octave`,
      `/rooms/${room.id}/compare?surveys=${surveys.map((s) => s.id).join(',')}&bands=third`,
      `/rooms/${room.id}/model`,
      sharedPath,
    ]
    for (const pagePath of pages) {
      await page.goto(`${running.baseUrl}${pagePath}`)
      await page.waitForLoadState('networkidle')
      const text = await page.locator('body').innerText()
      expect(text.length, pagePath).toBeGreaterThan(200)
      expect(text, pagePath).not.toMatch(INTERNAL)
    }
    await page.screenshot({ path: screenshotPath('44-shared-revision'), fullPage: true })
    expect(await page.getByTestId('shared-revision').textContent()).toContain('Report revision 1')
  })
})
