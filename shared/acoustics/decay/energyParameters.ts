import { integratedEnergyAt, type IntegratedDecay } from './schroederIntegral'

export interface EnergyParameters {
  /** Clarity, dB. */
  C50: number | null
  C80: number | null
  /** Definition, 0..1. */
  D50: number | null
  /** Centre time, s. */
  Ts: number | null
}

/** Energy after sample n: the integrated decay before t1, the exponential tail C·e^(−k(n−t1)/fs) after. */
function energyAfter(decay: IntegratedDecay, sample: number, decayRatePerS: number, sampleRateHz: number): number {
  if (sample < decay.endSample) return integratedEnergyAt(decay, sample)
  return decay.tailEnergy * Math.exp((-decayRatePerS * (sample - decay.endSample)) / sampleRateHz)
}

/**
 * C50, C80, D50 and Ts from t = 0 at the onset, with the energy past the noise truncation t1
 * taken from the exponential tail compensation (so the noise floor does not count as late energy):
 * C_te = 10·lg(∫₀^te p² / ∫_te^∞ p²); D50 = ∫₀^0.05 p² / ∫₀^∞ p²; Ts = ∫ t·p² / ∫ p²,
 * tail terms ∫_{t1}^∞ P̄e^(−k(t−t1)) = C and ∫ t·(…) = C·(t1 + 1/k). Sums over samples [0, N_te)
 * and [N_te, end) reproduce the integrals (facts §1.4).
 * @param energy p²[n] from the onset
 * @param decayRatePerS k of the tail (energy ∝ e^(−kt)); 0 when there is no tail
 * @see ISO 3382-1:2009 Eqs. (A.10), (A.11), (A.13) (via transcription)
 */
export function computeEnergyParameters(
  energy: Float64Array,
  decay: IntegratedDecay,
  options: { sampleRateHz: number; decayRatePerS: number },
): EnergyParameters {
  const { sampleRateHz, decayRatePerS } = options
  const total = integratedEnergyAt(decay, 0)
  if (!(total > 0)) return { C50: null, C80: null, D50: null, Ts: null }
  const after50 = energyAfter(decay, Math.round(0.05 * sampleRateHz), decayRatePerS, sampleRateHz)
  const after80 = energyAfter(decay, Math.round(0.08 * sampleRateHz), decayRatePerS, sampleRateHz)
  let moment = 0
  for (let n = 0; n < decay.endSample; n++) moment += n * (energy[n] as number)
  const endS = decay.endSample / sampleRateHz
  const tailMoment = decay.tailEnergy > 0 && decayRatePerS > 0 ? decay.tailEnergy * (endS + 1 / decayRatePerS) : 0
  const clarity = (after: number) => (after > 0 ? 10 * Math.log10((total - after) / after) : null)
  return {
    C50: clarity(after50),
    C80: clarity(after80),
    D50: (total - after50) / total,
    Ts: (moment / sampleRateHz + tailMoment) / total,
  }
}
