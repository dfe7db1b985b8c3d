import { getRealFftPlan } from './realFftPlan'
import { createRealSpectrum, type RealSpectrum } from './realSpectrum'

export interface ForwardRealFftOptions {
  /** Transform size, a power of two ≥ 4 and ≥ input length; the input is zero-padded to it. */
  size: number
  /** Reused result, created when absent (must have size/2 + 1 bins). */
  output?: RealSpectrum
}

/**
 * DFT of a real signal, X[k] = Σ x[n]·e^(−j2πkn/N), for k = 0 … N/2, zero-padded to N.
 *
 * The N real samples are packed as N/2 complex values z[n] = x[2n] + j·x[2n+1] and transformed
 * with one half-size fft.js plan; then X[k] = E[k] + W_N^k·O[k] with
 * E[k] = (Z[k] + Z*[N/2−k])/2, O[k] = (Z[k] − Z*[N/2−k])/(2j), W_N = e^(−j2π/N)
 * (the standard "two-for-one" real FFT, e.g. Press et al., Numerical Recipes §12.3).
 * @param input - samples, length ≤ size (not modified)
 * @returns the half spectrum (size/2 + 1 bins)
 */
export function forwardRealFft(input: Float64Array, options: ForwardRealFftOptions): RealSpectrum {
  const { size } = options
  const plan = getRealFftPlan(size)
  const half = size / 2
  const packed = plan.packed
  const count = Math.min(input.length, size)
  packed.set(count === input.length ? input : input.subarray(0, count))
  packed.fill(0, count)
  const z = plan.transformed
  plan.halfTransform.transform(z, packed)
  const output = options.output ?? createRealSpectrum(size)
  const { re, im } = output
  const cosTable = plan.twiddleCos
  const sinTable = plan.twiddleSin
  for (let k = 0; k <= half; k++) {
    const a = k === half ? 0 : 2 * k
    const b = k === 0 ? 0 : 2 * (half - k)
    const zr = z[a] as number
    const zi = z[a + 1] as number
    const cr = z[b] as number
    const ci = -(z[b + 1] as number)
    const er = 0.5 * (zr + cr)
    const ei = 0.5 * (zi + ci)
    // (Z − conj Z')/(2j): divide (dr + j·di) by 2j → (di − j·dr)/2.
    const or = 0.5 * (zi - ci)
    const oi = -0.5 * (zr - cr)
    // W_N^k = cos − j·sin.
    const wr = cosTable[k] as number
    const wi = -(sinTable[k] as number)
    re[k] = er + wr * or - wi * oi
    im[k] = ei + wr * oi + wi * or
  }
  return output
}
