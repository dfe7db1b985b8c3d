/**
 * Smallest power of two ≥ `sampleCount` (and ≥ 1).
 * @param sampleCount - a non-negative length
 * @returns 2^⌈log2(sampleCount)⌉
 */
export function nextPowerOfTwo(sampleCount: number): number {
  let size = 1
  while (size < sampleCount) size *= 2
  return size
}

/** True when `size` is 1, 2, 4, 8 … */
export function isPowerOfTwo(size: number): boolean {
  return Number.isInteger(size) && size > 0 && (size & (size - 1)) === 0
}
