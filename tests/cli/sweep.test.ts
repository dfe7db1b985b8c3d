import { spawnSync } from 'node:child_process'
import { mkdtempSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { decodeWav } from '../../shared/acoustics/wav/decodeWav'
import { expectWithin } from '../helpers/tolerance'

const directory = mkdtempSync(join(tmpdir(), 'ringdown-sweep-'))
afterAll(() => rmSync(directory, { recursive: true, force: true }))

function runSweep(args: string[]) {
  const result = spawnSync(process.execPath, ['--import', 'tsx', 'cli/sweep.ts', ...args], { encoding: 'utf8' })
  return { status: result.status, stdout: result.stdout, stderr: result.stderr }
}

describe('sweep CLI', () => {
  it('returns a 24-bit WAV of the sweep with its silences and a loudness caution on stderr', () => {
    const file = join(directory, 'sweep.wav')
    const run = runSweep(['--f1', '20', '--f2', '20000', '--seconds', '2', '--rate', '48000', file])
    expect(run.status).toBe(0)
    expect(run.stderr).toMatch(/Caution: test sweeps are loud/)
    expect(run.stdout).toMatch(/L = 0\.28953 s/)
    const decoded = decodeWav(new Uint8Array(readFileSync(file)))
    expect(decoded.sampleRateHz).toBe(48000)
    expect(decoded.bitDepth).toBe(24)
    expect(decoded.samples.length).toBe((0.5 + 2 + 2) * 48000)
    const peak = decoded.samples.reduce((max, v) => Math.max(max, Math.abs(v)), 0)
    expectWithin(20 * Math.log10(peak), -6, 0.01)
  })

  it('returns a 16-bit file at the requested level and rate when given --bits and --level-db', () => {
    const file = join(directory, 'quiet.wav')
    const run = runSweep(['--f1', '50', '--f2', '10000', '--seconds', '1', '--rate', '44100', '--level-db', '-20', '--bits', '16', file])
    expect(run.status).toBe(0)
    const decoded = decodeWav(new Uint8Array(readFileSync(file)))
    expect([decoded.sampleRateHz, decoded.bitDepth]).toEqual([44100, 16])
    const peak = decoded.samples.reduce((max, v) => Math.max(max, Math.abs(v)), 0)
    expectWithin(20 * Math.log10(peak), -20, 0.01)
  })

  it.each([
    { name: 'f2 above half the rate', args: ['--f1', '20', '--f2', '30000', '--seconds', '2', '--rate', '48000'], message: /below half the sample rate/ },
    { name: 'a non-numeric f1', args: ['--f1', 'abc', '--f2', '20000', '--seconds', '2', '--rate', '48000'], message: /--f1 must be a number/ },
    { name: 'a missing rate', args: ['--f1', '20', '--f2', '20000', '--seconds', '2'], message: /--rate is required/ },
    { name: 'an unsupported bit depth', args: ['--f1', '20', '--f2', '20000', '--seconds', '2', '--rate', '48000', '--bits', '8'], message: /--bits must be/ },
    { name: 'an unknown option', args: ['--f1', '20', '--f2', '20000', '--seconds', '2', '--rate', '48000', '--loud'], message: /Unknown option/ },
  ])('exits 1 with one clear stderr line and no stack trace when given $name', ({ args, message }) => {
    const run = runSweep([...args, join(directory, 'bad.wav')])
    expect(run.status).toBe(1)
    const lines = run.stderr.trim().split('\n')
    expect(lines).toHaveLength(1)
    expect(lines[0]).toMatch(message)
    expect(run.stderr).not.toMatch(/\n\s+at /)
  })

  it('exits 1 with the usage line when the output file is missing', () => {
    const run = runSweep(['--f1', '20', '--f2', '20000', '--seconds', '2', '--rate', '48000'])
    expect(run.status).toBe(1)
    expect(run.stderr).toMatch(/^sweep: usage: sweep --f1/)
  })
})
