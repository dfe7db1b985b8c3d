/**
 * Half-power bandwidth of a room mode from the reverberation time: B = δ/π = 2.2/T Hz, with the
 * amplitude damping constant δ = 3·ln10/T ≈ 6.9/T (1/s) — the standard textbook relation, closed
 * form (energy decays as e^(−2δt), falling 60 dB in T).
 *
 * @returns bandwidth, Hz (T = 0.5 s → 4.4 Hz)
 */
export function modalBandwidthHz(reverberationTimeS: number): number {
  if (!(reverberationTimeS > 0)) throw new RangeError('reverberationTimeS must be positive')
  return (3 * Math.LN10) / (Math.PI * reverberationTimeS)
}

/** Damping constant δ = 3·ln10/T ≈ 6.91/T, 1/s (amplitude). */
export function modalDampingPerS(reverberationTimeS: number): number {
  return (3 * Math.LN10) / reverberationTimeS
}
