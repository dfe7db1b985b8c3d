/** Share of the gate (after the onset) over which the half-Hann taper falls to zero. */
const TAPER_FRACTION = 0.25

/**
 * Time-gated copy of an impulse response: samples before the onset and in the first 75 % of the
 * gate are kept, the last 25 % fall to zero with a half-Hann taper, and everything from
 * onset + gate on is dropped (a right-sided gate against late reflections; taper share: common
 * practice, no source). The input is not modified.
 * @param gateSampleCount - gate length after the onset, samples (≥ 1)
 * @returns the gated response, length min(impulse length, onset + gate)
 */
export function applyTimeGate(impulse: Float64Array, onsetSample: number, gateSampleCount: number): Float64Array {
  const end = Math.min(impulse.length, onsetSample + gateSampleCount)
  const gated = impulse.slice(0, end)
  const taperLength = Math.max(1, Math.round(gateSampleCount * TAPER_FRACTION))
  const taperStart = onsetSample + gateSampleCount - taperLength
  for (let i = Math.max(0, taperStart); i < end; i++) {
    const position = (i - taperStart + 0.5) / taperLength
    gated[i] = (gated[i] as number) * 0.5 * (1 + Math.cos(Math.PI * position))
  }
  return gated
}
