import { getRealFftPlan } from './realFftPlan'
import type { RealSpectrum } from './realSpectrum'

export interface InverseRealFftOptions {
  /** Reused result of at least spectrum.size samples, created when absent. */
  output?: Float64Array
}

/**
 * Inverse DFT of a real signal's half spectrum: x[n] = (1/N)·Σ_k X[k]·e^(j2πkn/N), using
 * X[N−k] = conj(X[k]). The imaginary parts of X[0] and X[N/2] are ignored (they are zero for a
 * real signal).
 *
 * Two-for-one inverse: E[k] = (X[k] + X*[N/2−k])/2, O[k] = (X[k] − X*[N/2−k])·W_N^(−k)/2,
 * Z[k] = E[k] + j·O[k]; z = IDFT_{N/2}(Z); x[2n] = Re z[n], x[2n+1] = Im z[n]
 * (Press et al., Numerical Recipes §12.3).
 * @returns the N real samples (a view of `output` when given)
 */
export function inverseRealFft(spectrum: RealSpectrum, options: InverseRealFftOptions = {}): Float64Array {
  const { size, re, im } = spectrum
  const plan = getRealFftPlan(size)
  const half = size / 2
  const packed = plan.packed
  const cosTable = plan.twiddleCos
  const sinTable = plan.twiddleSin
  for (let k = 0; k < half; k++) {
    const xr = re[k] as number
    const xi = k === 0 ? 0 : (im[k] as number)
    const cr = re[half - k] as number
    const ci = k === 0 ? 0 : -(im[half - k] as number)
    const er = 0.5 * (xr + cr)
    const ei = 0.5 * (xi + ci)
    const dr = 0.5 * (xr - cr)
    const di = 0.5 * (xi - ci)
    // W_N^(−k) = cos + j·sin.
    const wr = cosTable[k] as number
    const wi = sinTable[k] as number
    const or = dr * wr - di * wi
    const oi = dr * wi + di * wr
    // Z = E + j·O.
    packed[2 * k] = er - oi
    packed[2 * k + 1] = ei + or
  }
  const output = options.output ? options.output.subarray(0, size) : new Float64Array(size)
  plan.halfTransform.inverseTransform(output, packed)
  return output
}
