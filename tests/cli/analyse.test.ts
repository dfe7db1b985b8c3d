import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { encodeWav } from '../../shared/acoustics/wav/encodeWav'

const directory = mkdtempSync(join(tmpdir(), 'ringdown-cli-'))

function run(...args: string[]) {
  return spawnSync('npx', ['tsx', 'cli/analyse.ts', ...args], { cwd: process.cwd(), encoding: 'utf8' })
}

function impulseFile(): string {
  // Exponential decay (T = 0.5 s) under a deterministic sign pattern: broadband, no randomness.
  const k = (6 * Math.LN10) / 0.5
  const samples = new Float64Array(48000).map((_, n) => 0.8 * Math.exp((-k * n) / 48000 / 2) * (((n * 7919) % 13) - 6) / 6)
  const path = join(directory, 'decay.wav')
  writeFileSync(path, encodeWav(samples, { sampleRateHz: 48000, encoding: 'pcm24' }))
  return path
}

describe('cli/analyse', () => {
  it('prints one JSON object with the promised fields when given a good WAV', () => {
    const result = run(impulseFile(), '--json', '--bands', 'third')
    expect(result.status).toBe(0)
    const json = JSON.parse(result.stdout)
    expect(json.sampleRate).toBe(48000)
    expect(json.kind).toBe('impulse')
    expect(json.bands.length).toBeGreaterThan(20)
    for (const key of ['centreHz', 'T20', 'T30', 'EDT', 'C50', 'C80', 'D50', 'Ts', 'decayRangeDb', 'warnings']) expect(json.bands[0]).toHaveProperty(key)
    expect(json.broadband).not.toHaveProperty('centreHz')
    expect(json.broadband.T30).toBeCloseTo(0.5, 1)
    expect(json.frequencyResponse.frequencyHz.length).toBe(json.frequencyResponse.magnitudeDb.length)
  }, 60_000)

  it('prints a readable table without --json', () => {
    const result = run(impulseFile())
    expect(result.status).toBe(0)
    expect(result.stdout).toMatch(/Band Hz\s+T20 s/)
    expect(result.stdout).toMatch(/broadband/)
  }, 60_000)

  it('exits 1 with one line on stderr and no stack trace when the input is bad', () => {
    const notWav = join(directory, 'notes.wav')
    writeFileSync(notWav, 'plain text')
    for (const args of [[notWav], [join(directory, 'missing.wav')], [impulseFile(), '--bands', 'fifth'], [impulseFile(), '--channel', '3'], [impulseFile(), '--sweep-f1', '20']]) {
      const result = run(...args)
      expect(result.status, args.join(' ')).toBe(1)
      expect(result.stdout).toBe('')
      expect(result.stderr.trim().split('\n'), result.stderr).toHaveLength(1)
      expect(result.stderr).not.toMatch(/\n\s+at /)
    }
  }, 120_000)
})
