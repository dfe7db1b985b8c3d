import { chromium, type Browser } from 'playwright-core'
import { mkdirSync } from 'node:fs'
import path from 'node:path'

/** Debian's Chromium, with the flags this closed network needs (no background connections). */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--no-first-run', '--disable-sync'],
  })
}

/** Where browser tests keep their screenshots (ignored by git). */
export function screenshotPath(name: string): string {
  const dir = path.resolve('tests/output/screenshots')
  mkdirSync(dir, { recursive: true })
  return path.join(dir, `${name}.png`)
}
