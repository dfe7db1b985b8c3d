import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import path from 'node:path'
import type { Browser, Page } from 'playwright-core'
import { signInThroughPage } from '../helpers/signIn'
import { launchChromium, screenshotPath } from '../helpers/browser'
import { startRunningApp, type RunningApp } from '../helpers/runningApp'
import { DEMO_ACCOUNTS } from '../../server/db/demoData'
import { Room, Survey } from '../../server/models'

let running: RunningApp
let browser: Browser
let page: Page

beforeAll(async () => {
  running = await startRunningApp({ withWorker: true })
  browser = await launchChromium()
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } })
  await signInThroughPage(page, running.baseUrl, DEMO_ACCOUNTS[0]!.email)
})
afterAll(async () => {
  await browser?.close()
  await running?.stop()
})

async function demoRoom() {
  const room = (await Room.findOne({ where: { name: 'Garden studio control room' } }))!
  const surveys = await Survey.findAll({ where: { roomId: room.id }, order: [['measuredOn', 'ASC']] })
  return { room, surveys }
}

describe('from upload to verdict in Chromium', () => {
  it('uploads a sample WAV, shows it done and a T30 value in its band table', async () => {
    const { room, surveys } = await demoRoom()
    await page.goto(`${running.baseUrl}/rooms/${room.id}/surveys/${surveys[0]!.id}`)
    await page.getByTestId('capture-file-input').setInputFiles(path.resolve('samples/small-room-ir.wav'))
    await page.getByTestId('upload-all').click()
    // The three demo captures come first; the upload is the fourth row (ordered by id).
    const rows = page.getByTestId('captures-table').locator('tbody tr')
    await expect.poll(() => rows.count(), { timeout: 30_000 }).toBe(4)
    const row = rows.nth(3)
    await row.getByTestId('capture-status').and(page.locator('[data-status="done"]')).waitFor({ timeout: 60_000 })
    await page.screenshot({ path: screenshotPath('10-survey-with-upload'), fullPage: true })

    await row.locator('a[data-testid^="capture-link-"]').click()
    await page.waitForURL(/\/captures\/\d+/)
    const table = page.getByTestId('band-table')
    await table.waitFor({ timeout: 30_000 })
    // samples/README.md: the small room's 1 kHz octave was synthesised with T60 = 0.35 s.
    await expect.poll(() => table.textContent(), { timeout: 30_000 }).toMatch(/T30/)
    const rowAt1k = table.locator('tr', { hasText: /^\s*1k/ }).first()
    await expect.poll(async () => (await rowAt1k.textContent()) ?? '').toMatch(/0\.3\d/)
    await page.screenshot({ path: screenshotPath('11-capture-page'), fullPage: true })
  })

  it('opens the comparison of the demo surveys and shows both curves and the verdict', async () => {
    const { room, surveys } = await demoRoom()
    await page.goto(`${running.baseUrl}/rooms/${room.id}/compare?surveys=${surveys.map((s) => s.id).join(',')}&bands=octave`)
    const strip = page.getByTestId('verdict-strip')
    await strip.waitFor({ timeout: 60_000 })
    await expect.poll(() => strip.textContent(), { timeout: 60_000 }).toMatch(/inside target/i)
    await expect.poll(() => page.getByTestId('compare-summary').textContent()).toMatch(/After panels and bass traps: \d of \d judged octave bands inside the target/)
    const pageText = (await page.locator('main').textContent()) ?? ''
    expect(pageText).toContain('Bare room')
    expect(pageText).toContain('After panels and bass traps')
    await page.getByTestId('compare-decays').waitFor()
    expect(await page.locator('canvas').count()).toBeGreaterThanOrEqual(3)
    await page.screenshot({ path: screenshotPath('12-compare'), fullPage: true })
  })
})
