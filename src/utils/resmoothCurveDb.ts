/**
 * Smooths an already sampled dB curve to 1/N octave for display: at each point, the power
 * average of the points inside [f·2^(−1/(2N)), f·2^(+1/(2N))] (the same window and power
 * averaging as the engine's smoothSpectrum, acoustics-facts §6, common practice). Coarser
 * smoothing of a finer curve only; it cannot add detail the curve does not have.
 * @param frequencyHz ascending grid, Hz
 * @param levelDb level at each grid point, dB (non-finite values are left out of the average)
 * @param fraction N of 1/N octave
 */
export function resmoothCurveDb(frequencyHz: readonly number[], levelDb: readonly number[], fraction: number): number[] {
  const halfWidth = Math.pow(2, 1 / (2 * fraction))
  const power = levelDb.map((db) => (Number.isFinite(db) ? Math.pow(10, db / 10) : Number.NaN))
  let low = 0
  let high = 0
  let sum = 0
  let count = 0
  return frequencyHz.map((f) => {
    // Sliding window over the ascending grid: O(n) for the whole curve.
    while (high < frequencyHz.length && (frequencyHz[high] as number) <= f * halfWidth) {
      const p = power[high] as number
      if (!Number.isNaN(p)) { sum += p; count += 1 }
      high += 1
    }
    while (low < high && (frequencyHz[low] as number) < f / halfWidth) {
      const p = power[low] as number
      if (!Number.isNaN(p)) { sum -= p; count -= 1 }
      low += 1
    }
    return count > 0 && sum > 0 ? 10 * Math.log10(sum / count) : Number.NaN
  })
}
