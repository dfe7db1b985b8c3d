import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Browser, Page } from 'playwright-core'
import { launchChromium, screenshotPath } from '../helpers/browser'
import { startRunningApp, type RunningApp } from '../helpers/runningApp'
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../server/db/demoData'

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

describe('rooms flow in Chromium', () => {
  it('signs in with a demo account, creates a room and sees it in the rooms table', async () => {
    await page.goto(`${running.baseUrl}/rooms`)
    await page.waitForURL(/\/sign-in/)
    await page.getByTestId('sign-in-email').locator('input').fill(DEMO_ACCOUNTS[0]!.email)
    await page.getByTestId('sign-in-password').locator('input').fill(DEMO_PASSWORD)
    await page.screenshot({ path: screenshotPath('01-sign-in') })
    await page.getByTestId('sign-in-submit').click()
    await page.waitForURL(/\/rooms/)
    const table = page.getByTestId('rooms-table')
    await expect.poll(() => table.textContent()).toContain('Garden studio control room')
    await page.screenshot({ path: screenshotPath('02-rooms'), fullPage: true })

    await page.getByTestId('new-room').click()
    await page.getByTestId('room-name').locator('input').fill('Browser test mix room')
    await page.getByTestId('room-client').locator('input').fill('Test client')
    await page.getByTestId('room-length').locator('input').fill('5.2')
    await page.getByTestId('room-width').locator('input').fill('3.9')
    await page.getByTestId('room-height').locator('input').fill('2.6')
    await page.screenshot({ path: screenshotPath('03-new-room-form') })
    await page.getByTestId('room-save').click()
    await page.waitForURL(/\/rooms\/\d+/)
    await page.screenshot({ path: screenshotPath('04-room-page'), fullPage: true })

    await page.goto(`${running.baseUrl}/rooms`)
    await expect.poll(() => page.getByTestId('rooms-table').textContent()).toContain('Browser test mix room')
    await page.screenshot({ path: screenshotPath('05-rooms-with-new-room'), fullPage: true })
  })
})
