/**
 * Suffix sums S[n] = Σ_{m ≥ n} e[m], n = 0 … N (S[N] = 0), summed from the quiet end so small
 * late terms are not lost. Any window energy is then S[a] − S[b] in O(1).
 * @param output buffer of length ≥ N + 1 (reused across bands)
 */
export function suffixEnergySums(energy: Float64Array, output: Float64Array = new Float64Array(energy.length + 1)): Float64Array {
  let sum = 0
  output[energy.length] = 0
  for (let i = energy.length - 1; i >= 0; i--) {
    sum += energy[i] as number
    output[i] = sum
  }
  return output
}

/** A Schroeder curve held implicitly: E[n] = tailEnergy + S[n] − S[endSample] for n < endSample. */
export interface IntegratedDecay {
  suffixEnergy: Float64Array
  /** Integration limit t1 (exclusive), samples from the onset. */
  endSample: number
  /** Compensation C for the energy after t1 (sample-energy units); 0 = plain truncation. */
  tailEnergy: number
}

/** E[n] of an {@link IntegratedDecay}. */
export function integratedEnergyAt(decay: IntegratedDecay, sample: number): number {
  const { suffixEnergy, endSample, tailEnergy } = decay
  return tailEnergy + (suffixEnergy[sample] as number) - (suffixEnergy[endSample] as number)
}

/**
 * Schroeder backward integration E(t) = C + ∫_t^{t1} p²(τ) dτ, sampled (sum instead of integral).
 * With t1 = end and C = 0 this is Schroeder's original E(t) = ∫_t^∞ p² dτ; with a noise floor,
 * t1 and C come from {@link lundebyTruncation}.
 * @param energy squared impulse response p²[n] from the onset
 * @returns E[0 … t1−1] in the same units as energy (sample sums)
 * @see ISO 3382-1:2009 5.3.3 Eqs. (1), (3) (via transcription); M. R. Schroeder, JASA 37 (1965) 409.
 */
export function schroederIntegral(energy: Float64Array, options: { endSample?: number; tailEnergy?: number } = {}): Float64Array {
  const endSample = Math.min(energy.length, options.endSample ?? energy.length)
  const result = new Float64Array(endSample)
  let sum = options.tailEnergy ?? 0
  for (let i = endSample - 1; i >= 0; i--) {
    sum += energy[i] as number
    result[i] = sum
  }
  return result
}

/** Schroeder curve in dB re its start: L[n] = 10·lg(E[n]/E[0]). */
export function schroederCurveDb(integral: Float64Array): Float64Array {
  const start = integral[0] as number
  const levels = new Float64Array(integral.length)
  for (let i = 0; i < integral.length; i++) levels[i] = 10 * Math.log10(Math.max(integral[i] as number, 1e-300) / start)
  return levels
}
