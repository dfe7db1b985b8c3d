import { forwardRealFft } from './forwardRealFft'
import { inverseRealFft } from './inverseRealFft'
import { nextPowerOfTwo } from './nextPowerOfTwo'

/**
 * Hilbert transform H{x} by FFT, so that x + j·H{x} is the analytic signal: multiply the
 * spectrum by −j for positive frequencies, +j for negative ones and 0 at DC and Nyquist
 * (equivalently: zero the negative frequencies and double the positive ones, as
 * scipy.signal.hilbert documents). Zero-padded to the next power of two; the transform is
 * circular, so a signal that does not start and end near zero shows edge effects there (an impulse
 * response does: it starts before the onset and ends in noise).
 * @param signal - real samples (not modified)
 * @returns H{x}, same length as the input
 */
export function hilbertTransform(signal: Float64Array): Float64Array {
  const size = Math.max(4, nextPowerOfTwo(signal.length))
  const spectrum = forwardRealFft(signal, { size })
  const { re, im } = spectrum
  const half = size / 2
  re[0] = 0
  im[0] = 0
  re[half] = 0
  im[half] = 0
  for (let k = 1; k < half; k++) {
    // (a + j·b)·(−j) = b − j·a
    const a = re[k] as number
    re[k] = im[k] as number
    im[k] = -a
  }
  return inverseRealFft(spectrum).slice(0, signal.length)
}
