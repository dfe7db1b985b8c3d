/**
 * Sabine constant K = 24·ln10/c (s per unit length): 0.16111 s/m at c = 343 m/s; with c in ft/s
 * it gives the imperial constant (≈ 0.049 s/ft). Facts §8, Master Handbook of Acoustics ch. 11.
 */
export function sabineConstant(speedOfSound: number): number {
  return (24 * Math.LN10) / speedOfSound
}

/**
 * Sabine: T = K·V / (A + 4mV) (facts §8). Units consistent with K (m, m², m³ or ft, ft², ft³).
 *
 * @param absorptionArea - A = Σ S_i·α_i plus added absorbers
 * @param airAbsorptionArea - 4mV (default 0)
 * @returns T, s
 */
export function sabineReverberationTimeS(volume: number, absorptionArea: number, constantK: number, airAbsorptionArea = 0): number {
  return (constantK * volume) / (absorptionArea + airAbsorptionArea)
}

/**
 * Eyring: T = K·V / (−S·ln(1 − ᾱ) + 4mV), ᾱ = A/S (facts §8; V = 50 m³, S = 85 m², ᾱ = 0.2 →
 * 0.4244 s). Returns null where ᾱ ≥ 1 (the formula has no value there).
 */
export function eyringReverberationTimeS(volume: number, surfaceArea: number, meanAbsorption: number, constantK: number, airAbsorptionArea = 0): number | null {
  if (meanAbsorption >= 1) return null
  return (constantK * volume) / (-surfaceArea * Math.log(1 - meanAbsorption) + airAbsorptionArea)
}
