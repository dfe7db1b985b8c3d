import { readFileSync } from 'node:fs'
import { parseArgs } from 'node:util'
import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '../shared/acoustics/analyseCapture'
import { DspInputError } from '../shared/acoustics/errors'
import { checkReferenceSweep, type SignalLength } from '../shared/acoustics/sweep/checkReferenceSweep'
import { decodeWav } from '../shared/acoustics/wav/decodeWav'
import type { AnalysisSettings, SmoothingFraction } from '../shared/types/analysis'
import { analysisToCliJson } from './analysisToCliJson'
import { formatAnalysisTable } from './formatAnalysisTable'

const USAGE = 'usage: analyse <file.wav> [--json] [--bands octave|third] [--channel N] [--smoothing N] [--sweep-f1 HZ --sweep-f2 HZ --sweep-seconds S | --reference sweep.wav]'
const SMOOTHINGS = [1, 3, 6, 12, 24, 48]

/** An input problem the user can fix: printed as one line, exit code 1. */
class UsageError extends Error {}

function readBytes(path: string): Uint8Array {
  try {
    return new Uint8Array(readFileSync(path))
  } catch (error) {
    throw new UsageError(`cannot read ${path}: ${(error as NodeJS.ErrnoException).code ?? 'read error'}`)
  }
}

function numberOption(value: string | undefined, name: string): number | undefined {
  if (value === undefined) return undefined
  const parsed = Number(value)
  if (!Number.isFinite(parsed)) throw new UsageError(`--${name} must be a number (got "${value}")`)
  return parsed
}

function parseSettings(values: Record<string, string | boolean | undefined>): AnalysisSettings {
  const bands = (values.bands as string | undefined) ?? 'octave'
  if (bands !== 'octave' && bands !== 'third') throw new UsageError(`--bands must be octave or third (got "${bands}")`)
  const smoothing = numberOption(values.smoothing as string | undefined, 'smoothing') ?? DEFAULT_ANALYSIS_SETTINGS.smoothing
  if (!SMOOTHINGS.includes(smoothing)) throw new UsageError(`--smoothing must be one of ${SMOOTHINGS.join(', ')} (got ${smoothing})`)
  const channel = numberOption(values.channel as string | undefined, 'channel') ?? 0
  if (!Number.isInteger(channel) || channel < 0) throw new UsageError(`--channel must be a whole number from 0 (got ${channel})`)
  return { ...DEFAULT_ANALYSIS_SETTINGS, bands, smoothing: smoothing as SmoothingFraction, channel }
}

function sweepOptions(values: Record<string, string | boolean | undefined>, recording: SignalLength) {
  const f1Hz = numberOption(values['sweep-f1'] as string | undefined, 'sweep-f1')
  const f2Hz = numberOption(values['sweep-f2'] as string | undefined, 'sweep-f2')
  const durationS = numberOption(values['sweep-seconds'] as string | undefined, 'sweep-seconds')
  const reference = values.reference as string | undefined
  const given = [f1Hz, f2Hz, durationS].filter((value) => value !== undefined).length
  if (given > 0 && reference) throw new UsageError('give either --sweep-f1/--sweep-f2/--sweep-seconds or --reference, not both')
  if (given > 0 && given < 3) throw new UsageError('a sweep needs all of --sweep-f1, --sweep-f2 and --sweep-seconds')
  if (given === 3) return { kind: 'sweep' as const, sweep: { f1Hz: f1Hz as number, f2Hz: f2Hz as number, durationS: durationS as number } }
  if (!reference) return { kind: 'impulse' as const }
  const decoded = decodeWav(readBytes(reference))
  checkReferenceSweep(recording, { sampleRateHz: decoded.sampleRateHz, frameCount: decoded.samples.length })
  return { kind: 'sweep' as const, referenceSweep: decoded.samples }
}

function main(argv: string[]): void {
  const { values, positionals } = parseArgs({
    args: argv,
    allowPositionals: true,
    options: {
      json: { type: 'boolean' },
      bands: { type: 'string' },
      channel: { type: 'string' },
      smoothing: { type: 'string' },
      'sweep-f1': { type: 'string' },
      'sweep-f2': { type: 'string' },
      'sweep-seconds': { type: 'string' },
      reference: { type: 'string' },
    },
  })
  if (positionals.length !== 1) throw new UsageError(USAGE)
  const file = positionals[0] as string
  const settings = parseSettings(values)
  const decoded = decodeWav(readBytes(file), { channel: settings.channel })
  const sweep = sweepOptions(values, { sampleRateHz: decoded.sampleRateHz, frameCount: decoded.samples.length })
  const result = analyseCapture(decoded.samples, { sampleRateHz: decoded.sampleRateHz, settings, inputWarnings: decoded.warnings, ...sweep })
  const output = values.json
    ? JSON.stringify(analysisToCliJson(result, { file, channel: settings.channel, inputWarnings: decoded.warnings }))
    : formatAnalysisTable(result, file)
  process.stdout.write(`${output}\n`)
}

try {
  main(process.argv.slice(2))
} catch (error) {
  // Known input problems get their own sentence; anything else one line too, never a stack trace.
  const isKnown = error instanceof UsageError || error instanceof DspInputError || (error as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')
  const message = error instanceof Error ? error.message : String(error)
  process.stderr.write(`analyse: ${isKnown ? '' : 'analysis failed: '}${message.split('\n')[0]}\n`)
  process.exitCode = 1
}
