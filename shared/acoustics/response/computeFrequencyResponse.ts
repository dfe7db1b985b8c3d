import type { SmoothingFraction } from '../../types/analysis'
import { DspInputError } from '../errors'
import { forwardRealFft } from '../fft/forwardRealFft'
import { nextPowerOfTwo } from '../fft/nextPowerOfTwo'
import { validateSignal } from '../validateSignal'
import { applyTimeGate } from './applyTimeGate'
import { logFrequencyGrid } from './logFrequencyGrid'
import { smoothSpectrum } from './smoothSpectrum'
import { validateOnset } from './validateOnset'

export interface FrequencyResponseOptions {
  sampleRateHz: number
  /** 1/N-octave smoothing: 1, 3, 6, 12, 24 or 48. */
  smoothingFraction: SmoothingFraction
  /** Time gate after the onset, ms; null or absent = the whole response. */
  gateMs?: number | null
  /** Sample taken as t = 0: its delay is removed from the phase, and the gate starts there. Default 0. */
  onsetSample?: number
  /** Number of log-spaced output points, 20 Hz … min(20 kHz, fs/2). Default 480. */
  pointCount?: number
}

export interface FrequencyResponse {
  frequencyHz: number[]
  /** 10·lg of the power-smoothed |H|², dB re unit gain (a unit impulse reads 0 dB at every f). */
  magnitudeDb: number[]
  /** Phase of the vector-smoothed H after removing the onset delay, wrapped to (−180°, 180°]. */
  phaseDeg: number[]
}

const SMOOTHING_FRACTIONS = [1, 3, 6, 12, 24, 48]
const MIN_GRID_HZ = 20
const MAX_GRID_HZ = 20000
const FLOOR_DB = -300

/**
 * Magnitude and phase of an impulse response on a log-spaced grid (never raw FFT bins).
 *
 * H(f) = Σ h[n]·e^(−j2πfn/fs) of the (optionally gated) response, zero-padded to ≥ fs samples
 * (bins ≤ 1 Hz apart); magnitude = 10·lg of the 1/N-octave power average of |H|² over
 * [f·2^(−1/(2N)), f·2^(1/(2N))] (acoustics-facts §6), in dB re unit gain — absolute, so a digital
 * filter reads its own gain and a recording reads its level re full scale. Phase = arg of the
 * vector average of H·e^(+j2πf·onset/fs), i.e. after removing the onset delay, wrapped.
 * A gate of g ms cannot resolve detail below about 1000/g Hz.
 * @throws DspInputError on an empty, silent or non-finite impulse, a bad onset, gate or option
 */
export function computeFrequencyResponse(impulse: Float64Array, options: FrequencyResponseOptions): FrequencyResponse {
  const { sampleRateHz, smoothingFraction, gateMs = null, onsetSample = 0, pointCount = 480 } = options
  validateSignal(impulse, { sampleRateHz, label: 'impulse response' })
  validateOnset(onsetSample, impulse.length)
  if (!SMOOTHING_FRACTIONS.includes(smoothingFraction)) {
    throw new DspInputError('bad-smoothing', `Smoothing must be 1/1, 1/3, 1/6, 1/12, 1/24 or 1/48 octave (got 1/${smoothingFraction}).`)
  }
  if (!Number.isInteger(pointCount) || pointCount < 2) {
    throw new DspInputError('bad-point-count', `pointCount must be a whole number of at least 2 (got ${pointCount}).`)
  }
  if (gateMs !== null && !(Number.isFinite(gateMs) && gateMs > 0)) {
    throw new DspInputError('bad-gate', `The time gate must be a positive number of milliseconds (got ${gateMs}).`)
  }
  const maxHz = Math.min(MAX_GRID_HZ, sampleRateHz / 2)
  if (maxHz <= MIN_GRID_HZ) {
    throw new DspInputError('bad-sample-rate', `The sample rate ${sampleRateHz} Hz is too low for a 20 Hz–20 kHz response.`)
  }
  const analysed = gateMs === null ? impulse : applyTimeGate(impulse, onsetSample, Math.max(1, Math.round((gateMs * sampleRateHz) / 1000)))
  const size = Math.max(4, nextPowerOfTwo(Math.max(analysed.length, Math.ceil(sampleRateHz))))
  const spectrum = forwardRealFft(analysed, { size })
  removeDelayInPlace(spectrum.re, spectrum.im, onsetSample, size)
  const frequencyHz = logFrequencyGrid(MIN_GRID_HZ, maxHz, pointCount)
  const smoothed = smoothSpectrum(spectrum, { binHz: sampleRateHz / size, frequencyHz, smoothingFraction })
  const magnitudeDb: number[] = new Array(pointCount)
  const phaseDeg: number[] = new Array(pointCount)
  for (let i = 0; i < pointCount; i++) {
    const power = smoothed.power[i] as number
    magnitudeDb[i] = power > 0 ? Math.max(FLOOR_DB, 10 * Math.log10(power)) : FLOOR_DB
    const degrees = (Math.atan2(smoothed.im[i] as number, smoothed.re[i] as number) * 180) / Math.PI
    phaseDeg[i] = degrees === -180 ? 180 : degrees
  }
  return { frequencyHz, magnitudeDb, phaseDeg }
}

/** Multiplies bin k by e^(+j2πk·delay/size): the spectrum of the response advanced by `delay` samples. */
function removeDelayInPlace(re: Float64Array, im: Float64Array, delaySamples: number, size: number): void {
  if (delaySamples === 0) return
  for (let k = 0; k < re.length; k++) {
    // k·delay may be large: reduce it modulo size before the trig, for accuracy.
    const angle = (2 * Math.PI * ((k * delaySamples) % size)) / size
    const c = Math.cos(angle)
    const s = Math.sin(angle)
    const r = re[k] as number
    const i = im[k] as number
    re[k] = r * c - i * s
    im[k] = r * s + i * c
  }
}
