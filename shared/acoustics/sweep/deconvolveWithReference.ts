import { forwardRealFft } from '../fft/forwardRealFft'
import { inverseRealFft } from '../fft/inverseRealFft'
import { nextPowerOfTwo } from '../fft/nextPowerOfTwo'

/** ε as a share of max|X|²: −60 dB, far below the in-band sweep spectrum (common practice, no source). */
const REGULARISATION = 1e-6
/** Width of the raised-cosine band edges, octaves (inside the band). */
const EDGE_OCTAVES = 1 / 6

/** Raised-cosine band-limiting weight: 0 outside [lowHz, highHz], 1 from 1/6 octave inside its edges. */
function bandWeight(frequencyHz: number, lowHz: number, highHz: number): number {
  if (frequencyHz <= lowHz || frequencyHz >= highHz) return 0
  const edge = Math.min(EDGE_OCTAVES, 0.5 * Math.log2(highHz / lowHz))
  const fromLow = Math.log2(frequencyHz / lowHz) / edge
  const fromHigh = Math.log2(highHz / frequencyHz) / edge
  const position = Math.min(1, fromLow, fromHigh)
  return 0.5 * (1 - Math.cos(Math.PI * position))
}

/**
 * Linear deconvolution by regularised spectral division, H = Y·conj(X)/(|X|² + ε)·W (ISO 18233:2006
 * B.5, Fig. B.3), zero-padded to ≥ nY + nX − 1 so no lag wraps onto another. W band-limits the
 * result to the sweep's range (raised-cosine edges) so noise outside it is not amplified.
 * @returns lags −(nX − 1) … nY − 1 in order (index nX − 1 is lag 0): length nY + nX − 1
 */
export function deconvolveWithReference(
  recording: Float64Array,
  reference: Float64Array,
  options: { sampleRateHz: number; lowHz: number; highHz: number },
): Float64Array {
  const { sampleRateHz, lowHz, highHz } = options
  const size = Math.max(4, nextPowerOfTwo(recording.length + reference.length - 1))
  const x = forwardRealFft(reference, { size })
  const y = forwardRealFft(recording, { size })
  let maxPower = 0
  for (let k = 0; k < x.re.length; k++) maxPower = Math.max(maxPower, (x.re[k] as number) ** 2 + (x.im[k] as number) ** 2)
  const epsilon = REGULARISATION * maxPower
  const binHz = sampleRateHz / size
  for (let k = 0; k < x.re.length; k++) {
    const weight = bandWeight(k * binHz, lowHz, highHz)
    const xr = x.re[k] as number
    const xi = x.im[k] as number
    const yr = y.re[k] as number
    const yi = y.im[k] as number
    const scale = weight / (xr * xr + xi * xi + epsilon)
    // Y·X* = (yr + j·yi)(xr − j·xi)
    y.re[k] = scale * (yr * xr + yi * xi)
    y.im[k] = scale * (yi * xr - yr * xi)
  }
  const circular = inverseRealFft(y)
  const lagCount = recording.length + reference.length - 1
  const output = new Float64Array(lagCount)
  const negativeLags = reference.length - 1
  output.set(circular.subarray(size - negativeLags, size), 0)
  output.set(circular.subarray(0, recording.length), negativeLags)
  return output
}
