import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Browser, Page } from 'playwright-core'
import { signInThroughPage } from '../helpers/signIn'
import { launchChromium, screenshotPath } from '../helpers/browser'
import { startRunningApp, type RunningApp } from '../helpers/runningApp'
import { DEMO_ACCOUNTS } from '../../server/db/demoData'
import { Room } from '../../server/models'

let running: RunningApp
let browser: Browser
let page: Page

beforeAll(async () => {
  running = await startRunningApp()
  browser = await launchChromium()
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } })
  await signInThroughPage(page, running.baseUrl, DEMO_ACCOUNTS[1]!.email)
})
afterAll(async () => {
  await browser?.close()
  await running?.stop()
})

/** Positions of every drawn first-reflection point, as "surface speaker cx cy". */
async function reflectionPoints(): Promise<string[]> {
  return page.getByTestId('reflection-point').evaluateAll((nodes) =>
    nodes.map((n) => `${n.getAttribute('data-surface')} ${n.getAttribute('data-speaker')} ${n.getAttribute('cx')} ${n.getAttribute('cy')}`),
  )
}

describe('room model in Chromium', () => {
  it('moves the listener and redraws the reflection points and the predicted bass response', async () => {
    const room = (await Room.findOne({ where: { name: 'Garden studio control room' } }))!
    await page.goto(`${running.baseUrl}/rooms/${room.id}/model`)
    await page.getByTestId('layout-plan').waitFor()
    await expect.poll(async () => (await reflectionPoints()).length).toBeGreaterThanOrEqual(10)
    const bassSummary = page.getByTestId('bass-response').getByTestId('chart-summary')
    const pointsBefore = await reflectionPoints()
    const bassBefore = await bassSummary.textContent()
    await page.screenshot({ path: screenshotPath('20-room-model-before'), fullPage: true })

    const listenerX = page.getByTestId('listener-x').locator('input')
    await listenerX.fill('3.1')
    await listenerX.press('Enter')
    await expect.poll(reflectionPoints).not.toEqual(pointsBefore)
    await expect.poll(() => bassSummary.textContent()).not.toBe(bassBefore)

    // Keyboard: the focused listener handle moves 5 cm per arrow key.
    await page.getByTestId('listener-handle').first().focus()
    const pointsAfterTyping = await reflectionPoints()
    await page.keyboard.press('ArrowLeft')
    await expect.poll(reflectionPoints).not.toEqual(pointsAfterTyping)
    await page.screenshot({ path: screenshotPath('21-room-model-after'), fullPage: true })
  })
})
