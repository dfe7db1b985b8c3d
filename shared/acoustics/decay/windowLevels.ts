/** Levels of the squared IR averaged in consecutive windows (Lundeby step 1 / 6). */
export interface WindowLevels {
  /** 10·lg(mean energy per sample) of each window, dB (absolute). */
  levelDb: Float64Array
  /** Window centre, s from the onset. */
  timeS: Float64Array
}

/**
 * Averages energy in consecutive windows of `windowSamples` using suffix sums (O(1) per window).
 * @param suffixEnergy S[n] = Σ_{m ≥ n} e[m], length N + 1
 */
export function windowLevels(suffixEnergy: Float64Array, windowSamples: number, sampleRateHz: number): WindowLevels {
  const sampleCount = suffixEnergy.length - 1
  const windowCount = Math.max(1, Math.floor(sampleCount / windowSamples))
  const size = Math.min(windowSamples, sampleCount)
  const levelDb = new Float64Array(windowCount)
  const timeS = new Float64Array(windowCount)
  for (let w = 0; w < windowCount; w++) {
    const start = w * size
    const mean = ((suffixEnergy[start] as number) - (suffixEnergy[start + size] as number)) / size
    levelDb[w] = 10 * Math.log10(Math.max(mean, 1e-300))
    timeS[w] = (start + size / 2) / sampleRateHz
  }
  return { levelDb, timeS }
}

/** Mean energy per sample over e[start … N−1]. */
export function meanEnergyFrom(suffixEnergy: Float64Array, startSample: number): number {
  const sampleCount = suffixEnergy.length - 1
  return (suffixEnergy[startSample] as number) / Math.max(1, sampleCount - startSample)
}
