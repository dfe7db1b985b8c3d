import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mkdtemp, rm, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import type { Browser, Page } from 'playwright-core'
import { signInThroughPage } from '../helpers/signIn'
import { launchChromium, screenshotPath } from '../helpers/browser'
import { startRunningApp, type RunningApp } from '../helpers/runningApp'
import { decayingNoiseWav } from '../helpers/wavFixtures'
import { DEMO_ACCOUNTS } from '../../server/db/demoData'
import { Room, Survey } from '../../server/models'

// The survey page follows an upload through the live status stream: the status column moves
// queued → analysing → done with no reload and no request for the captures list after the upload.

let running: RunningApp
let browser: Browser
let page: Page
let scratch: string

beforeAll(async () => {
  running = await startRunningApp({ withWorker: true })
  scratch = await mkdtemp(path.join(tmpdir(), 'ringdown-live-'))
  browser = await launchChromium()
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } })
  await signInThroughPage(page, running.baseUrl, DEMO_ACCOUNTS[0]!.email)
})
afterAll(async () => {
  await browser?.close()
  await running?.stop()
  await rm(scratch, { recursive: true, force: true })
})

/** Records every status each capture row shows, in order, as the DOM changes. */
async function recordRowStatuses(target: Page): Promise<void> {
  await target.evaluate(() => {
    const log: Record<string, string[]> = {}
    const scan = () => {
      for (const row of document.querySelectorAll('[data-testid="captures-table"] tbody tr')) {
        const id = row.querySelector('a[data-testid^="capture-link-"]')?.getAttribute('data-testid')?.replace('capture-link-', '')
        const status = row.querySelector('[data-testid="capture-status"]')?.getAttribute('data-status')
        if (!id || !status) continue
        const seen = (log[id] ??= [])
        if (seen[seen.length - 1] !== status) seen.push(status)
      }
    }
    scan()
    new MutationObserver(scan).observe(document.body, { subtree: true, childList: true, attributes: true, attributeFilter: ['data-status'] })
    Object.assign(window, { ringdownStatusLog: log, ringdownPageMarker: 'not reloaded' })
  })
}

describe('live status on the survey page', () => {
  it('moves an upload from queued through analysing to done by server-sent events, without polling', async () => {
    const room = (await Room.findOne({ where: { name: 'Garden studio control room' } }))!
    const survey = (await Survey.findOne({ where: { roomId: room.id }, order: [['measuredOn', 'ASC']] }))!
    // A 6 s file keeps the worker busy long enough for the page to show each stage.
    const filePath = path.join(scratch, 'long-decay.wav')
    await writeFile(filePath, decayingNoiseWav({ sampleRateHz: 48_000, durationS: 6, t60S: 0.6, seed: 5 }))

    await page.goto(`${running.baseUrl}/rooms/${room.id}/surveys/${survey.id}`)
    await page.locator('[data-testid="survey-captures"][data-live="true"]').waitFor({ timeout: 30_000 })
    const rows = page.getByTestId('captures-table').locator('tbody tr')
    await expect.poll(() => rows.count(), { timeout: 30_000 }).toBe(3)
    // The demo captures are analysed first (they are queued at start): let the page settle.
    await expect.poll(() => page.locator('[data-testid="captures-table"] [data-status="done"]').count(), { timeout: 90_000 }).toBe(3)
    await recordRowStatuses(page)

    const listRequests: string[] = []
    const captureRequests: string[] = []
    page.on('request', (request) => {
      const url = new URL(request.url())
      if (request.method() !== 'GET') return
      if (url.pathname === `/api/surveys/${survey.id}/captures`) listRequests.push(url.href)
      if (/^\/api\/captures\/\d+$/.test(url.pathname)) captureRequests.push(url.href)
    })
    await page.getByTestId('capture-file-input').setInputFiles(filePath)
    await page.getByTestId('upload-all').click()

    await expect.poll(() => rows.count(), { timeout: 30_000 }).toBe(4)
    const newRow = rows.nth(3)
    await newRow.getByTestId('capture-status').and(page.locator('[data-status="done"]')).waitFor({ timeout: 90_000 })
    await page.screenshot({ path: screenshotPath('40-live-status-done'), fullPage: true })

    const newId = (await newRow.locator('a[data-testid^="capture-link-"]').getAttribute('data-testid'))!.replace('capture-link-', '')
    const statuses = await page.evaluate((id) => (window as unknown as { ringdownStatusLog: Record<string, string[]> }).ringdownStatusLog[id] ?? [], newId)
    const queuedAt = Math.max(statuses.indexOf('queued'), statuses.indexOf('uploaded'))
    expect(queuedAt, statuses.join(' → ')).toBeGreaterThanOrEqual(0)
    expect(statuses.indexOf('analysing'), statuses.join(' → ')).toBeGreaterThan(queuedAt)
    expect(statuses[statuses.length - 1]).toBe('done')
    expect(statuses.indexOf('done')).toBeGreaterThan(statuses.indexOf('analysing'))
    // Everything came through the stream: the list and the capture were never fetched again.
    expect(listRequests).toEqual([])
    expect(captureRequests).toEqual([])
    expect(await page.evaluate(() => (window as unknown as { ringdownPageMarker?: string }).ringdownPageMarker)).toBe('not reloaded')
    await expect.poll(async () => (await newRow.textContent()) ?? '').toMatch(/0\.\d\d/)
  })
})
