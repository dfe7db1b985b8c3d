import { DspInputError } from '../errors'
import { sweepRateS } from './sweepRate'

/** What defines an exponential sweep; all times in seconds. */
export interface SweepOptions {
  f1Hz: number
  f2Hz: number
  /** Length of the sweep itself, without silences, s. */
  durationS: number
  sampleRateHz: number
  /** Peak level, dBFS (≤ 0). Default −6. */
  levelDb?: number
  /** Half-Hann fade-in length, s. Default: the time the sweep takes for its first quarter octave. */
  fadeInS?: number
  /** Half-Hann fade-out length, s. Default: the time of its last 1/24 octave. */
  fadeOutS?: number
  leadingSilenceS?: number
  trailingSilenceS?: number
}

export type ResolvedSweepOptions = Required<SweepOptions>

const DEFAULT_LEVEL_DB = -6
const MAX_DURATION_S = 300

function fail(message: string): never {
  throw new DspInputError('bad-sweep-options', message)
}

function checkNonNegative(value: number, name: string): void {
  if (!(Number.isFinite(value) && value >= 0)) fail(`${name} must be zero or a positive number of seconds (got ${value}).`)
}

/**
 * Validates sweep options and fills in the defaults: 0 < f1 < f2 < fs/2, 0 < T ≤ 300 s with at
 * least 64 samples, level ≤ 0 dBFS, fades and silences ≥ 0, fade-in + fade-out ≤ T.
 * Default fades (a quarter octave in, 1/24 octave out) follow the common practice of a gentle
 * start and a short end (ISO 18233 B.3.3 asks for fades; lengths: common practice, no source).
 * @throws DspInputError 'bad-sweep-options' with one sentence naming the bad value
 */
export function resolveSweepOptions(options: SweepOptions): ResolvedSweepOptions {
  const { f1Hz, f2Hz, durationS, sampleRateHz } = options
  if (!(Number.isFinite(sampleRateHz) && sampleRateHz > 0)) fail(`The sample rate must be a positive number of hertz (got ${sampleRateHz}).`)
  if (!(Number.isFinite(f1Hz) && f1Hz > 0)) fail(`The start frequency must be above 0 Hz (got ${f1Hz}).`)
  if (!(Number.isFinite(f2Hz) && f2Hz > f1Hz)) fail(`The end frequency must be above the start frequency (got ${f1Hz}–${f2Hz} Hz).`)
  if (!(f2Hz < sampleRateHz / 2)) fail(`The end frequency must be below half the sample rate, ${sampleRateHz / 2} Hz (got ${f2Hz}).`)
  if (!(Number.isFinite(durationS) && durationS > 0)) fail(`The sweep duration must be a positive number of seconds (got ${durationS}).`)
  if (durationS > MAX_DURATION_S) fail(`The sweep duration must be at most ${MAX_DURATION_S} s (got ${durationS}).`)
  if (Math.round(durationS * sampleRateHz) < 64) fail(`The sweep must last at least 64 samples (got ${durationS} s at ${sampleRateHz} Hz).`)
  const levelDb = options.levelDb ?? DEFAULT_LEVEL_DB
  if (!(Number.isFinite(levelDb) && levelDb <= 0)) fail(`The level must be at most 0 dBFS (got ${levelDb}).`)
  const octaveS = sweepRateS(f1Hz, f2Hz, durationS) * Math.LN2
  const fadeInS = options.fadeInS ?? Math.min(octaveS / 4, durationS / 10)
  const fadeOutS = options.fadeOutS ?? Math.min(octaveS / 24, durationS / 20)
  const leadingSilenceS = options.leadingSilenceS ?? 0
  const trailingSilenceS = options.trailingSilenceS ?? 0
  checkNonNegative(fadeInS, 'The fade-in')
  checkNonNegative(fadeOutS, 'The fade-out')
  checkNonNegative(leadingSilenceS, 'The leading silence')
  checkNonNegative(trailingSilenceS, 'The trailing silence')
  if (leadingSilenceS + trailingSilenceS > MAX_DURATION_S) fail(`The silences must total at most ${MAX_DURATION_S} s.`)
  if (fadeInS + fadeOutS > durationS) fail(`The fades (${fadeInS} s + ${fadeOutS} s) are longer than the sweep (${durationS} s).`)
  return { f1Hz, f2Hz, durationS, sampleRateHz, levelDb, fadeInS, fadeOutS, leadingSilenceS, trailingSilenceS }
}
