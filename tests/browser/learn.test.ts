import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Browser, Page } from 'playwright-core'
import { launchChromium, screenshotPath } from '../helpers/browser'
import { startRunningApp, type RunningApp } from '../helpers/runningApp'

let running: RunningApp
let browser: Browser
let page: Page

beforeAll(async () => {
  running = await startRunningApp()
  browser = await launchChromium()
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } })
})
afterAll(async () => {
  await browser?.close()
  await running?.stop()
})

describe('teaching view in Chromium', () => {
  it('recomputes the decay in the browser when the teacher changes the 1 kHz reverberation time', async () => {
    await page.goto(`${running.baseUrl}/learn`)
    const results = page.getByTestId('learn-results')
    const tableRowAt1k = results.getByTestId('band-table').locator('tr', { hasText: /^\s*1k/ }).first()
    await expect.poll(async () => (await tableRowAt1k.textContent()) ?? '', { timeout: 30_000 }).toMatch(/\d\.\d\d/)
    const before = await tableRowAt1k.textContent()
    await page.screenshot({ path: screenshotPath('40-learn'), fullPage: true })
    const slider = page.getByTestId('learn-t60-1000').locator('[role="slider"]').first()
    await slider.focus()
    for (let i = 0; i < 10; i++) await page.keyboard.press('ArrowRight')
    await expect.poll(() => tableRowAt1k.textContent(), { timeout: 30_000 }).not.toBe(before)
    await page.screenshot({ path: screenshotPath('41-learn-changed'), fullPage: true })
  })
})
