import { DspInputError } from '../errors'
import { createSosCascade, type SosCascade } from '../filters/sosCascade'

/**
 * Peaking-EQ biquad from the Audio EQ Cookbook (R. Bristow-Johnson): with A = 10^(gainDb/40),
 * ω0 = 2π·f0/fs, α = sin ω0/(2Q):
 * b = [1 + α·A, −2 cos ω0, 1 − α·A], a = [1 + α/A, −2 cos ω0, 1 − α/A], normalised by a0.
 * Its gain is gainDb at f0 and 0 dB far from it. Used as a filter with a known response.
 * @returns a one-section cascade (b0, b1, b2, a1, a2)
 */
export function peakingEqBiquad(options: { sampleRateHz: number; centreHz: number; gainDb: number; q: number }): SosCascade {
  const { sampleRateHz, centreHz, gainDb, q } = options
  if (!(centreHz > 0 && centreHz < sampleRateHz / 2 && q > 0 && Number.isFinite(gainDb))) {
    throw new DspInputError('bad-filter', `A peaking filter needs 0 < f0 < fs/2, Q > 0 and a finite gain (got ${centreHz} Hz, Q ${q}, ${gainDb} dB).`)
  }
  const amplitude = Math.pow(10, gainDb / 40)
  const omega = (2 * Math.PI * centreHz) / sampleRateHz
  const alpha = Math.sin(omega) / (2 * q)
  const cosine = Math.cos(omega)
  const a0 = 1 + alpha / amplitude
  return createSosCascade([
    [(1 + alpha * amplitude) / a0, (-2 * cosine) / a0, (1 - alpha * amplitude) / a0, (-2 * cosine) / a0, (1 - alpha / amplitude) / a0],
  ])
}
