/** Zeroth-order modified Bessel function I0 by its power series (converges fast for x < 30). */
function besselI0(x: number): number {
  let sum = 1
  let term = 1
  for (let k = 1; k < 50; k++) {
    term *= (x / (2 * k)) ** 2
    sum += term
    if (term < 1e-17 * sum) break
  }
  return sum
}

/** Kaiser β for a stop-band attenuation A > 50 dB: β = 0.1102·(A − 8.7) (Kaiser 1974). */
const STOPBAND_DB = 100
const BETA = 0.1102 * (STOPBAND_DB - 8.7)
/** Pass band up to 0.2·fs, stop band from 0.3·fs: transition Δω = 0.2π. Length from Kaiser's formula. */
const HALF_LENGTH = Math.ceil((STOPBAND_DB - 8) / (2.285 * 0.2 * Math.PI) / 2)

/**
 * Linear-phase half-band low-pass for decimation by two: h[k] = sin(πk/2)/(πk)·w_Kaiser[k],
 * k = −M … M, cut-off fs/4; every even tap except the centre is zero. Kaiser window for
 * ≥ 100 dB stop band above 0.3·fs, pass-band ripple far below 0.01 dB up to 0.2·fs.
 * @returns taps h[0 … M] (symmetric: h[−k] = h[k]); h[0] = 0.5
 * @see J. F. Kaiser, "Nonrecursive digital filter design using the I0-sinh window function", IEEE ISCAS 1974.
 */
export function designHalfBandLowPass(): Float64Array {
  const taps = new Float64Array(HALF_LENGTH + 1)
  const norm = besselI0(BETA)
  for (let k = 0; k <= HALF_LENGTH; k++) {
    const ideal = k === 0 ? 0.5 : Math.sin((Math.PI * k) / 2) / (Math.PI * k)
    const ratio = k / (HALF_LENGTH + 1)
    taps[k] = (ideal * besselI0(BETA * Math.sqrt(1 - ratio * ratio))) / norm
  }
  return taps
}

/** |H(f)| of a symmetric FIR given by h[0 … M]: H = h[0] + 2·Σ h[k]·cos(2πfk/fs). */
export function symmetricFirMagnitudeAt(taps: Float64Array, frequencyHz: number, sampleRateHz: number): number {
  const omega = (2 * Math.PI * frequencyHz) / sampleRateHz
  let sum = taps[0] as number
  for (let k = 1; k < taps.length; k++) sum += 2 * (taps[k] as number) * Math.cos(omega * k)
  return Math.abs(sum)
}
