import type { DistortionBand } from '../../types/analysis'
import { DspInputError } from '../errors'
import { validateSignal } from '../validateSignal'
import { deconvolveWithInverse } from './deconvolveWithInverse'
import { deconvolveWithReference } from './deconvolveWithReference'
import { estimateSweepFromReference } from './estimateSweepFromReference'
import { harmonicDistortion } from './harmonicDistortion'
import { separateHarmonics, type SeparatedResponses } from './separateHarmonics'
import { resolveSweepOptions } from './sweepOptions'
import { harmonicDelayS, sweepRateS as computeSweepRateS } from './sweepRate'

export interface DeconvolveSweepOptions {
  sampleRateHz: number
  /** The sweep that was played (as generateSweep made it); levelDb defaults to −6 dBFS. */
  sweep?: { f1Hz: number; f2Hz: number; durationS: number; fadeInS?: number; fadeOutS?: number; leadingSilenceS?: number; levelDb?: number }
  /** Or the samples of the sweep file that was played (same rate as the recording). */
  referenceSweep?: Float64Array
  /** Highest harmonic order kept apart. Default 5. */
  maxHarmonicOrder?: number
}

export interface DeconvolvedSweep {
  /** The linear impulse response: causal part, with 10 ms kept before it. */
  impulse: Float64Array
  /** Index in `impulse` of the sweep's nominal start (t = 0 of the playback). */
  timeZeroSample: number
  /** Harmonic responses k = 2 … (each starts a few ms before its peak). */
  harmonicImpulses: { order: number; impulse: Float64Array }[]
  /** Distortion per octave band; empty when it could not be estimated (see notes). */
  distortion: DistortionBand[]
  /** The sweep rate L used, s (null when unknown). */
  sweepRateS: number | null
  /** Plain sentences on what was skipped and why. */
  notes: string[]
}

/** Decay kept after the sweep when the recording stops with it, s (common practice, no source). */
const MIN_TAIL_S = 0.1
/** Longest response kept after time zero, s: longer recordings add only noise in small rooms. */
const MAX_TAIL_S = 10
/** Margin searched before the highest harmonic and after a late start, s. */
const SEARCH_MARGIN_S = 0.02

/**
 * Turns a recording of an exponential sweep into the room's impulse response (Farina 2000;
 * ISO 18233:2006 Annex B), keeping the harmonic-distortion responses apart (Δt_k = L·ln k before
 * the linear one) and reporting distortion per octave band.
 * - With `sweep` parameters: convolution with the sweep's inverse filter (B.5, Fig. B.2), exact
 *   linear convolution by one overlap-save block; the impulse keeps the recorded time after the
 *   sweep (at least 0.1 s, at most 10 s).
 * - With `referenceSweep`: regularised spectral division Y·conj(X)/(|X|² + ε), band-limited to the
 *   sweep's range (B.5, Fig. B.3). L is estimated from the reference; if it is not an exponential
 *   sweep the distortion is skipped and a note says so.
 * @param recording - the recorded channel, same sample rate
 * @throws DspInputError on bad input (empty, silent, non-finite, shorter than the sweep, both or
 *   neither of sweep/referenceSweep, invalid sweep parameters)
 */
export function deconvolveSweep(recording: Float64Array, options: DeconvolveSweepOptions): DeconvolvedSweep {
  const { sampleRateHz, sweep, referenceSweep, maxHarmonicOrder = 5 } = options
  validateSignal(recording, { sampleRateHz, label: 'recording' })
  if ((sweep === undefined) === (referenceSweep === undefined)) {
    throw new DspInputError('bad-sweep-options', 'Give either the sweep parameters or the reference sweep, not both and not neither.')
  }
  if (!(Number.isInteger(maxHarmonicOrder) && maxHarmonicOrder >= 1)) {
    throw new DspInputError('bad-sweep-options', `The highest harmonic order must be a whole number ≥ 1 (got ${maxHarmonicOrder}).`)
  }
  return sweep !== undefined
    ? fromParameters(recording, { ...sweep, sampleRateHz }, maxHarmonicOrder)
    : fromReference(recording, referenceSweep as Float64Array, sampleRateHz, maxHarmonicOrder)
}

function tailSamplesAfter(recordingLength: number, sweepEndSample: number, sampleRateHz: number): number {
  const recordedTail = recordingLength - sweepEndSample
  return Math.min(Math.round(MAX_TAIL_S * sampleRateHz), Math.max(recordedTail, Math.round(MIN_TAIL_S * sampleRateHz)))
}

function fromParameters(
  recording: Float64Array,
  sweepOptions: NonNullable<DeconvolveSweepOptions['sweep']> & { sampleRateHz: number },
  maxOrder: number,
): DeconvolvedSweep {
  const resolved = resolveSweepOptions({ ...sweepOptions, trailingSilenceS: 0 })
  const { sampleRateHz, f1Hz, f2Hz, durationS } = resolved
  const sweepLength = Math.round(durationS * sampleRateHz)
  const sweepStart = Math.round(resolved.leadingSilenceS * sampleRateHz)
  if (recording.length < sweepLength) {
    throw new DspInputError('too-short', `The recording (${(recording.length / sampleRateHz).toFixed(2)} s) is shorter than the sweep (${durationS} s); record the whole sweep and the decay after it.`)
  }
  const rateS = computeSweepRateS(f1Hz, f2Hz, durationS)
  const tailSamples = tailSamplesAfter(recording.length, sweepStart + sweepLength, sampleRateHz)
  const margin = Math.round(SEARCH_MARGIN_S * sampleRateHz)
  const before = Math.round(harmonicDelayS(rateS, Math.max(2, maxOrder) + 0.5) * sampleRateHz) + margin
  // Time zero is where the inverse filter compresses the sweep: the sweep's start + N − 1.
  const zeroIndex = sweepStart + sweepLength - 1
  const firstIndex = zeroIndex - before
  const deconvolved = deconvolveWithInverse(recording, {
    sweep: resolved,
    inverseLength: sweepLength,
    firstIndex,
    count: before + tailSamples + margin,
  })
  const separated = separateHarmonics(deconvolved, { zeroIndex: before, sampleRateHz, sweepRateS: rateS, tailSamples, maxOrder })
  return assemble(separated, { sampleRateHz, f1Hz, f2Hz, rateS, notes: [] })
}

function fromReference(recording: Float64Array, reference: Float64Array, sampleRateHz: number, maxOrder: number): DeconvolvedSweep {
  validateSignal(reference, { sampleRateHz, label: 'reference sweep' })
  const estimate = estimateSweepFromReference(reference, sampleRateHz)
  const notes: string[] = []
  let { startHz, endHz } = estimate
  if (estimate.sweepRateS === null || startHz === null || endHz === null) {
    notes.push('The reference is not an exponential sweep, so harmonic distortion was not separated or estimated.')
    startHz = 1
    endHz = 0.5 * sampleRateHz
  }
  const deconvolved = deconvolveWithReference(recording, reference, { sampleRateHz, lowHz: startHz, highHz: endHz })
  const tailSamples = tailSamplesAfter(recording.length, estimate.endSample + 1, sampleRateHz)
  const separated = separateHarmonics(deconvolved, {
    zeroIndex: reference.length - 1,
    sampleRateHz,
    sweepRateS: estimate.sweepRateS,
    tailSamples,
    maxOrder,
  })
  return assemble(separated, { sampleRateHz, f1Hz: startHz, f2Hz: endHz, rateS: estimate.sweepRateS, notes })
}

function assemble(
  separated: SeparatedResponses,
  context: { sampleRateHz: number; f1Hz: number; f2Hz: number; rateS: number | null; notes: string[] },
): DeconvolvedSweep {
  const { sampleRateHz, f1Hz, f2Hz, rateS, notes } = context
  const distortion = separated.harmonics.length > 0 ? harmonicDistortion(separated.harmonics, { sampleRateHz, f1Hz, f2Hz }) : []
  if (rateS !== null && separated.harmonics.length === 0) {
    notes.push('The recording holds too little time before the sweep response to separate harmonic distortion.')
  }
  return {
    impulse: separated.impulse,
    timeZeroSample: separated.timeZeroSample,
    harmonicImpulses: separated.harmonics.map(({ order, impulse }) => ({ order, impulse })),
    distortion,
    sweepRateS: rateS,
    notes,
  }
}
