import { writeFileSync } from 'node:fs'
import { parseArgs } from 'node:util'
import { DspInputError } from '../shared/acoustics/errors'
import { generateSweep } from '../shared/acoustics/sweep/generateSweep'
import { encodeWav, type WavEncoding } from '../shared/acoustics/wav/encodeWav'

const USAGE =
  'usage: sweep --f1 HZ --f2 HZ --seconds S --rate HZ [--level-db DB] [--bits 16|24|32] [--float] [--leading-silence S] [--trailing-silence S] out.wav'
const CAUTION =
  'Caution: test sweeps are loud. Start playback at a low volume and raise it slowly; protect your hearing and your loudspeakers.'
const ENCODINGS: Record<string, WavEncoding> = { '16': 'pcm16', '24': 'pcm24', '32': 'pcm32' }

/** An input problem the user can fix: printed as one line, exit code 1. */
class UsageError extends Error {}

function numberOption(value: string | undefined, name: string, fallback?: number): number {
  if (value === undefined) {
    if (fallback === undefined) throw new UsageError(`--${name} is required; ${USAGE}`)
    return fallback
  }
  const parsed = Number(value)
  if (value.trim() === '' || !Number.isFinite(parsed)) throw new UsageError(`--${name} must be a number (got "${value}")`)
  return parsed
}

/** parseArgs reads "--level-db -6" as two options; join a negative number to its option. */
function joinNegativeValues(argv: string[]): string[] {
  const joined: string[] = []
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i] as string
    const next = argv[i + 1]
    if (arg.startsWith('--') && !arg.includes('=') && next !== undefined && /^-(\d|\.\d)/.test(next)) {
      joined.push(`${arg}=${next}`)
      i++
    } else {
      joined.push(arg)
    }
  }
  return joined
}

function main(argv: string[]): void {
  const { values, positionals } = parseArgs({
    args: joinNegativeValues(argv),
    allowPositionals: true,
    options: {
      f1: { type: 'string' },
      f2: { type: 'string' },
      seconds: { type: 'string' },
      rate: { type: 'string' },
      'level-db': { type: 'string' },
      bits: { type: 'string' },
      float: { type: 'boolean' },
      'leading-silence': { type: 'string' },
      'trailing-silence': { type: 'string' },
    },
  })
  if (positionals.length !== 1) throw new UsageError(USAGE)
  const output = positionals[0] as string
  const sampleRateHz = numberOption(values.rate, 'rate')
  if (!Number.isInteger(sampleRateHz) || sampleRateHz < 8000 || sampleRateHz > 384000) {
    throw new UsageError(`--rate must be a whole number of hertz from 8000 to 384000 (got ${sampleRateHz})`)
  }
  const bits = values.bits ?? '24'
  const encoding = values.float ? 'float32' : ENCODINGS[bits]
  if (encoding === undefined) throw new UsageError(`--bits must be 16, 24 or 32 (got "${bits}")`)
  const { samples, parameters } = generateSweep({
    f1Hz: numberOption(values.f1, 'f1'),
    f2Hz: numberOption(values.f2, 'f2'),
    durationS: numberOption(values.seconds, 'seconds'),
    sampleRateHz,
    levelDb: numberOption(values['level-db'], 'level-db', -6),
    // Silence before the sweep and room for the decay after it (ISO 18233 6.3.2: > 30 dB of decay).
    leadingSilenceS: numberOption(values['leading-silence'], 'leading-silence', 0.5),
    trailingSilenceS: numberOption(values['trailing-silence'], 'trailing-silence', 2),
  })
  const bytes = encodeWav(samples, { sampleRateHz, encoding })
  try {
    writeFileSync(output, bytes)
  } catch (error) {
    throw new UsageError(`cannot write ${output}: ${(error as NodeJS.ErrnoException).code ?? 'write error'}`)
  }
  process.stderr.write(`${CAUTION}\n`)
  const format = encoding === 'float32' ? '32-bit float' : `${bits}-bit PCM`
  process.stdout.write(
    `wrote ${output}: ${parameters.f1Hz}–${parameters.f2Hz} Hz exponential sweep, ${parameters.durationS} s, ` +
      `${sampleRateHz} Hz ${format}, peak ${parameters.levelDb} dBFS, ${parameters.leadingSilenceS} s silence before and ` +
      `${parameters.trailingSilenceS} s after, L = ${parameters.sweepRateS.toFixed(5)} s\n`,
  )
}

try {
  main(process.argv.slice(2))
} catch (error) {
  const isKnown = error instanceof UsageError || error instanceof DspInputError || (error as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')
  const message = error instanceof Error ? error.message : String(error)
  process.stderr.write(`sweep: ${isKnown ? '' : 'failed: '}${message.split('\n')[0]}\n`)
  process.exitCode = 1
}
