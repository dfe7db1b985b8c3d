/** Level of silence: no finite dB value describes it. */
export const SILENCE_DB = -Infinity

/**
 * Peak level of a block of samples, dBFS: 20·log10(max |x|), full scale = 1 (AES17 defines dBFS
 * against a full-scale sine's peak). −Infinity for silence or an empty block.
 */
export function peakDbfs(samples: ArrayLike<number>): number {
  let peak = 0
  for (let i = 0; i < samples.length; i++) peak = Math.max(peak, Math.abs(samples[i] as number))
  return peak > 0 ? 20 * Math.log10(peak) : SILENCE_DB
}

/**
 * RMS level of a block of samples, dBFS re a full-scale square (peak 1, RMS 1):
 * 10·log10(mean x²). A full-scale sine reads 10·log10(1/2) = −3.01 dBFS on this scale.
 * −Infinity for silence or an empty block.
 */
export function rmsDbfs(samples: ArrayLike<number>): number {
  if (samples.length === 0) return SILENCE_DB
  let sumSquares = 0
  for (let i = 0; i < samples.length; i++) sumSquares += (samples[i] as number) ** 2
  const meanSquare = sumSquares / samples.length
  return meanSquare > 0 ? 10 * Math.log10(meanSquare) : SILENCE_DB
}
