import type { Page } from 'playwright-core'
import { DEMO_PASSWORD } from '../../server/db/demoData'

/**
 * Signs in through the sign-in page and waits for the rooms page. It waits until the page has
 * settled before typing (so a late session check cannot re-render the form under the test) and
 * fails with the sign-in response's status and body, not a bare navigation time-out, when the
 * server refuses.
 */
export async function signInThroughPage(page: Page, baseUrl: string, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`)
  await page.waitForLoadState('networkidle')
  await page.getByTestId('sign-in-email').locator('input').fill(email)
  await page.getByTestId('sign-in-password').locator('input').fill(password)
  const [response] = await Promise.all([
    page.waitForResponse((candidate) => candidate.url().endsWith('/api/auth/sign-in') && candidate.request().method() === 'POST'),
    page.getByTestId('sign-in-submit').click(),
  ])
  if (!response.ok()) throw new Error(`Sign-in as ${email} answered ${response.status()}: ${await response.text()}`)
  await page.waitForURL(/\/rooms/)
}
