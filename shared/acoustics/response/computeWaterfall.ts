import type { WaterfallData } from '../../types/analysis'
import { DspInputError } from '../errors'
import { validateSignal } from '../validateSignal'
import { logFrequencyGrid } from './logFrequencyGrid'
import { lowPassDecimate } from './lowPassDecimate'
import { slicePowerSpectrum, waterfallWindow } from './waterfallSlice'
import { validateOnset } from './validateOnset'

export interface WaterfallOptions {
  sampleRateHz: number
  /** Sample taken as t = 0 (the ISO 3382-1 onset). */
  onsetSample: number
  /** Frequency range, Hz. Defaults 20 and 300. */
  minHz?: number
  maxHz?: number
}

const WINDOW_MS = 300
const STEP_MS = 20
const SPAN_MS = 400
const RISE_MS = 5
const POINT_COUNT = 160
const FLOOR_DB = -60

/**
 * Low-frequency decay view (cumulative-spectral-decay style): spectra of 300 ms windows whose
 * start moves in ~20 ms steps from the onset to 400 ms after it, on 160 log-spaced frequencies.
 * Each window rises over 5 ms just before its start time (so the direct sound at t = 0 is kept
 * whole), stays flat, and falls with a half-Hann over its second half. The response is first
 * low-passed and decimated to about 4·maxHz for speed. Levels are dB re the maximum of the first
 * slice, clamped at −60 dB. (Window, step and span: common practice, no source.)
 * A mode ringing with reverberation time T falls by 60·Δt/T dB from slice to slice.
 * @returns slices levelDb[slice][frequency]; timeMs = start time of each slice re the onset
 */
export function computeWaterfall(impulse: Float64Array, options: WaterfallOptions): WaterfallData {
  const { sampleRateHz, onsetSample, minHz = 20, maxHz = 300 } = options
  validateSignal(impulse, { sampleRateHz, label: 'impulse response' })
  validateOnset(onsetSample, impulse.length)
  if (!(minHz > 0 && maxHz > minHz && maxHz < 0.4 * sampleRateHz)) {
    throw new DspInputError('bad-frequency-range', `The waterfall needs 0 < minHz < maxHz < 0.4·fs (got ${minHz}–${maxHz} Hz).`)
  }
  const factor = Math.max(1, Math.floor(sampleRateHz / (4 * maxHz)))
  const decimatedRateHz = sampleRateHz / factor
  const riseSamples = Math.max(1, Math.round((RISE_MS * decimatedRateHz) / 1000))
  const stepSamples = Math.max(1, Math.round((STEP_MS * decimatedRateHz) / 1000))
  const windowSamples = Math.round((WINDOW_MS * decimatedRateHz) / 1000) + riseSamples
  const sliceCount = Math.floor(SPAN_MS / STEP_MS) + 1
  const segmentStart = onsetSample - riseSamples * factor
  const segmentLength = ((sliceCount - 1) * stepSamples + windowSamples) * factor
  // Twice the length in zeros, so the circular low-pass cannot wrap the tail onto the start.
  const segment = new Float64Array(2 * segmentLength)
  for (let i = 0; i < segmentLength; i++) {
    const source = segmentStart + i
    if (source >= 0 && source < impulse.length) segment[i] = impulse[source] as number
  }
  const decimated = lowPassDecimate(segment, {
    sampleRateHz,
    factor,
    passHz: 1.2 * maxHz,
    stopHz: 0.45 * decimatedRateHz,
  })
  const frequencyHz = logFrequencyGrid(minHz, maxHz, POINT_COUNT)
  const window = waterfallWindow(windowSamples, riseSamples)
  const powers: Float64Array[] = []
  for (let s = 0; s < sliceCount; s++) {
    powers.push(slicePowerSpectrum(decimated, { startIndex: s * stepSamples, window, frequencyHz, sampleRateHz: decimatedRateHz }))
  }
  const first = powers[0] as Float64Array
  let reference = 0
  for (const p of first) reference = Math.max(reference, p)
  const levelDb = powers.map((slice) =>
    Array.from(slice, (p) => (p > 0 && reference > 0 ? Math.max(FLOOR_DB, 10 * Math.log10(p / reference)) : FLOOR_DB)),
  )
  const timeMs = Array.from({ length: sliceCount }, (_, s) => (1000 * s * stepSamples * factor) / sampleRateHz)
  return { frequencyHz, timeMs, levelDb }
}
