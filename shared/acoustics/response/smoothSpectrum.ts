import type { RealSpectrum } from '../fft/realSpectrum'

export interface SmoothedSpectrum {
  /** Power average |H_s(f)|² at each grid frequency. */
  power: Float64Array
  /** Complex (vector) average at each grid frequency, real and imaginary parts. */
  re: Float64Array
  im: Float64Array
}

function prefixSums(values: (k: number) => number, binCount: number): Float64Array {
  const sums = new Float64Array(binCount + 1)
  for (let k = 0; k < binCount; k++) sums[k + 1] = (sums[k] as number) + values(k)
  return sums
}

/**
 * 1/N-octave smoothing on a frequency grid: for each f, the mean over the FFT bins inside
 * [f·2^(−1/(2N)), f·2^(+1/(2N))] of |H|² (power average, rectangular weighting) and of H itself
 * (vector average, used for phase) — acoustics-facts §6 (common practice). Prefix sums make each
 * point O(1), so the whole curve is O(bins + points). Where the window holds no bin (low
 * frequencies, fine smoothing), the value is interpolated linearly between the two nearest bins.
 * @param spectrum - half spectrum of a real signal
 * @param binHz - bin spacing fs/size, Hz
 */
export function smoothSpectrum(
  spectrum: RealSpectrum,
  options: { binHz: number; frequencyHz: readonly number[]; smoothingFraction: number },
): SmoothedSpectrum {
  const { re, im } = spectrum
  const { binHz, frequencyHz, smoothingFraction } = options
  const binCount = re.length
  const powerAt = (k: number): number => (re[k] as number) ** 2 + (im[k] as number) ** 2
  const powerSums = prefixSums(powerAt, binCount)
  const reSums = prefixSums((k) => re[k] as number, binCount)
  const imSums = prefixSums((k) => im[k] as number, binCount)
  const halfWidth = Math.pow(2, 1 / (2 * smoothingFraction))
  const result: SmoothedSpectrum = {
    power: new Float64Array(frequencyHz.length),
    re: new Float64Array(frequencyHz.length),
    im: new Float64Array(frequencyHz.length),
  }
  for (let i = 0; i < frequencyHz.length; i++) {
    const f = frequencyHz[i] as number
    const low = Math.max(0, Math.ceil(f / halfWidth / binHz))
    const high = Math.min(binCount - 1, Math.floor((f * halfWidth) / binHz))
    if (high >= low) {
      const count = high - low + 1
      result.power[i] = ((powerSums[high + 1] as number) - (powerSums[low] as number)) / count
      result.re[i] = ((reSums[high + 1] as number) - (reSums[low] as number)) / count
      result.im[i] = ((imSums[high + 1] as number) - (imSums[low] as number)) / count
    } else {
      const position = Math.min(f / binHz, binCount - 1)
      const below = Math.min(Math.floor(position), binCount - 2)
      const fraction = position - below
      result.power[i] = (1 - fraction) * powerAt(below) + fraction * powerAt(below + 1)
      result.re[i] = (1 - fraction) * (re[below] as number) + fraction * (re[below + 1] as number)
      result.im[i] = (1 - fraction) * (im[below] as number) + fraction * (im[below + 1] as number)
    }
  }
  return result
}
