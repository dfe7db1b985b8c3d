import { DspInputError } from '../errors'
import { forwardRealFft } from './forwardRealFft'
import { inverseRealFft } from './inverseRealFft'
import { nextPowerOfTwo } from './nextPowerOfTwo'

/**
 * Linear (zero-padded, non-circular) convolution by FFT:
 * y[n] = Σ_m a[m]·b[n − m], n = 0 … na + nb − 2.
 * The transform size is the next power of two ≥ na + nb − 1, so nothing wraps around.
 * @returns y, length na + nb − 1
 * @throws DspInputError 'no-samples' when either input is empty
 */
export function fftConvolve(a: Float64Array, b: Float64Array): Float64Array {
  if (a.length === 0 || b.length === 0) {
    throw new DspInputError('no-samples', 'Convolution needs two non-empty signals.')
  }
  const outputLength = a.length + b.length - 1
  const size = Math.max(4, nextPowerOfTwo(outputLength))
  const spectrumA = forwardRealFft(a, { size })
  const spectrumB = forwardRealFft(b, { size })
  multiplySpectraInPlace(spectrumA.re, spectrumA.im, spectrumB.re, spectrumB.im)
  return inverseRealFft(spectrumA).slice(0, outputLength)
}

/**
 * Linear cross-correlation by FFT: r[m] = Σ_n a[n + m]·b[n] for lags m = −(nb − 1) … na − 1,
 * stored at index m + nb − 1 (so index nb − 1 is lag 0). Equals fftConvolve(a, reversed b).
 * @returns r, length na + nb − 1
 */
export function fftCorrelate(a: Float64Array, b: Float64Array): Float64Array {
  return fftConvolve(a, b.slice().reverse())
}

/** (aRe + j·aIm) ← (aRe + j·aIm)·(bRe + j·bIm), bin by bin. */
export function multiplySpectraInPlace(aRe: Float64Array, aIm: Float64Array, bRe: Float64Array, bIm: Float64Array): void {
  for (let k = 0; k < aRe.length; k++) {
    const ar = aRe[k] as number
    const ai = aIm[k] as number
    const br = bRe[k] as number
    const bi = bIm[k] as number
    aRe[k] = ar * br - ai * bi
    aIm[k] = ar * bi + ai * br
  }
}
