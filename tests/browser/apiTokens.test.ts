import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Browser, Page } from 'playwright-core'
import { signInThroughPage } from '../helpers/signIn'
import { launchChromium, screenshotPath } from '../helpers/browser'
import { startRunningApp, type RunningApp } from '../helpers/runningApp'
import { DEMO_ACCOUNTS } from '../../server/db/demoData'

let running: RunningApp
let browser: Browser
let page: Page
/** The secret the settings page showed, used by the later steps. */
let secret = ''

beforeAll(async () => {
  running = await startRunningApp()
  browser = await launchChromium()
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } })
})
afterAll(async () => {
  await browser?.close()
  await running?.stop()
})

describe('API tokens and the API reference in Chromium', () => {
  it('creates a token on the settings page, shows it once, and the token reaches the API', async () => {
    const engineer = DEMO_ACCOUNTS.find((account) => account.role === 'engineer')!
    await signInThroughPage(page, running.baseUrl, engineer.email)
    await page.getByTestId('user-menu').click()
    await page.getByTestId('settings-link').click()
    await page.waitForURL(/\/settings/)
    await expect.poll(() => page.getByTestId('api-tokens-table').textContent()).toContain('No API tokens yet')

    await page.getByTestId('api-token-name').locator('input').fill('Measuring rig, left speaker')
    await page.getByTestId('api-token-create').click()
    const secretField = page.getByTestId('api-token-secret').locator('input')
    await expect.poll(() => secretField.inputValue()).toMatch(/^rdt_[A-Za-z0-9_-]{43}$/)
    secret = await secretField.inputValue()
    await expect.poll(() => page.getByTestId('api-tokens-table').textContent()).toContain('Measuring rig, left speaker')
    await page.screenshot({ path: screenshotPath('api-tokens-01-created'), fullPage: true })

    const me = await fetch(`${running.baseUrl}/api/auth/me`, { headers: { authorization: `Bearer ${secret}` } })
    expect(me.status).toBe(200)
    expect(((await me.json()) as { user: { email: string } }).user.email).toBe(engineer.email)

    await page.reload()
    await expect.poll(() => page.getByTestId('api-tokens-table').textContent()).toContain('Measuring rig, left speaker')
    expect(await page.getByTestId('api-token-secret-notice').count()).toBe(0) // shown once only
    expect(await page.content()).not.toContain(secret)
  })

  it('revokes the token after a confirmation, and the API refuses it', async () => {
    const row = page.getByTestId('api-tokens-table').locator('tr', { hasText: 'Measuring rig, left speaker' })
    await row.getByRole('button', { name: /Revoke/ }).click()
    await page.getByTestId('confirm-action').click()
    await expect.poll(() => row.textContent()).toContain('Revoked')
    const refused = await fetch(`${running.baseUrl}/api/auth/me`, { headers: { authorization: `Bearer ${secret}` } })
    expect(refused.status).toBe(401)
    await page.screenshot({ path: screenshotPath('api-tokens-02-revoked'), fullPage: true })
  })

  it('opens the API reference from the settings page and shows the upload route with its fields', async () => {
    await page.getByTestId('api-reference-link').click()
    await page.waitForURL(/\/api-reference/)
    const upload = page.getByTestId('api-operation-post-api-surveys-surveyid-captures')
    await upload.getByRole('button').first().click()
    await expect.poll(() => upload.textContent()).toContain('receiverLabel')
    expect(await upload.textContent()).toContain('API token or browser session')
    await page.screenshot({ path: screenshotPath('api-tokens-03-reference'), fullPage: false })
    await upload.screenshot({ path: screenshotPath('api-tokens-04-reference-upload') })
  })
})
