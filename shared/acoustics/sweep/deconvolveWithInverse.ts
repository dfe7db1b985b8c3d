import { forwardRealFft } from '../fft/forwardRealFft'
import { multiplySpectraInPlace } from '../fft/fftConvolve'
import { inverseRealFft } from '../fft/inverseRealFft'
import { nextPowerOfTwo } from '../fft/nextPowerOfTwo'
import type { RealSpectrum } from '../fft/realSpectrum'
import { inverseSweep } from './inverseSweep'
import type { SweepOptions } from './sweepOptions'

/** The inverse filter's spectrum of the last call, reused while the sweep and size stay the same. */
let cachedInverse: { key: string; spectrum: RealSpectrum } | null = null

function inverseSpectrum(sweep: SweepOptions, size: number): RealSpectrum {
  const key = JSON.stringify([sweep.f1Hz, sweep.f2Hz, sweep.durationS, sweep.sampleRateHz, sweep.levelDb, sweep.fadeInS, sweep.fadeOutS, size])
  if (cachedInverse?.key === key) return cachedInverse.spectrum
  const spectrum = forwardRealFft(inverseSweep(sweep), { size })
  cachedInverse = { key, spectrum }
  return spectrum
}

/**
 * Part of the linear convolution y = recording ⊗ inverse (inverse = the sweep's inverse filter,
 * `inverseLength` samples): y[firstIndex … firstIndex + count − 1], computed exactly with one
 * overlap-save block — a circular convolution of size P ≥ count + inverseLength − 1 whose first
 * inverseLength − 1 outputs (the only ones that wrap) are discarded. Samples of the recording
 * outside its range count as zero, so this equals the zero-padded, non-circular result
 * (ISO 18233:2006 B.5) while needing a transform of about half the full length.
 * @returns count samples of y
 */
export function deconvolveWithInverse(
  recording: Float64Array,
  options: { sweep: SweepOptions; inverseLength: number; firstIndex: number; count: number },
): Float64Array {
  const { sweep, inverseLength, firstIndex, count } = options
  const size = Math.max(4, nextPowerOfTwo(count + inverseLength - 1))
  // y[m] = Σ_j rec[m − j]·inv[j]; the block starts where the first wanted output needs its oldest input.
  const blockStart = firstIndex - (inverseLength - 1)
  const block = new Float64Array(size)
  const from = Math.max(0, blockStart)
  const to = Math.min(recording.length, blockStart + size)
  if (to > from) block.set(recording.subarray(from, to), from - blockStart)
  const spectrum = forwardRealFft(block, { size })
  const filter = inverseSpectrum(sweep, size)
  multiplySpectraInPlace(spectrum.re, spectrum.im, filter.re, filter.im)
  const circular = inverseRealFft(spectrum, { output: block })
  return circular.slice(inverseLength - 1, inverseLength - 1 + count)
}
