import { forwardRealFft } from '../../../../shared/acoustics/fft/forwardRealFft'
import { inverseRealFft } from '../../../../shared/acoustics/fft/inverseRealFft'
import { nextPowerOfTwo } from '../../../../shared/acoustics/fft/nextPowerOfTwo'

/** Test helper: keeps lowHz…highHz of a signal (ideal band-pass by FFT, zero-padded ×2). */
export function bandLimit(signal: Float64Array, options: { sampleRateHz: number; lowHz: number; highHz: number }): Float64Array {
  const size = nextPowerOfTwo(2 * signal.length)
  const spectrum = forwardRealFft(signal, { size })
  for (let k = 0; k < spectrum.re.length; k++) {
    const f = (k * options.sampleRateHz) / size
    if (f < options.lowHz || f > options.highHz) {
      spectrum.re[k] = 0
      spectrum.im[k] = 0
    }
  }
  return inverseRealFft(spectrum).slice(0, signal.length)
}

/** Normalised correlation Σxy/√(Σx²·Σy²) over the common length. */
export function normalisedCorrelation(x: Float64Array, y: Float64Array): number {
  let sxy = 0
  let sxx = 0
  let syy = 0
  for (let i = 0; i < Math.min(x.length, y.length); i++) {
    sxy += (x[i] as number) * (y[i] as number)
    sxx += (x[i] as number) ** 2
    syy += (y[i] as number) ** 2
  }
  return sxy / Math.sqrt(sxx * syy)
}

/** Index of the largest |value|. */
export function peakIndex(signal: Float64Array): number {
  let best = 0
  for (let i = 1; i < signal.length; i++) if (Math.abs(signal[i] as number) > Math.abs(signal[best] as number)) best = i
  return best
}
