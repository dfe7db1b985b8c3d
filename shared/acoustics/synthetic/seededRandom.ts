/** A deterministic source of random numbers. */
export interface SeededRandom {
  /** Uniform in [0, 1). */
  uniform(): number
  /** Standard normal (mean 0, variance 1). */
  gaussian(): number
}

/**
 * Seeded PRNG: mulberry32 (a 32-bit-state generator by T. Ettinger, public domain; period 2^32)
 * for uniforms, and the Box–Muller transform for Gaussians (Box & Muller, Ann. Math. Stat. 29,
 * 1958). The same seed always gives the same sequence; it is for test signals, not cryptography.
 * @param seed - any number; its low 32 bits are used
 */
export function createSeededRandom(seed: number): SeededRandom {
  let state = seed >>> 0
  let spareGaussian: number | null = null
  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0
    let t = state
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
  const gaussian = (): number => {
    if (spareGaussian !== null) {
      const value = spareGaussian
      spareGaussian = null
      return value
    }
    // 1 − u keeps the logarithm's argument in (0, 1].
    const radius = Math.sqrt(-2 * Math.log(1 - uniform()))
    const angle = 2 * Math.PI * uniform()
    spareGaussian = radius * Math.sin(angle)
    return radius * Math.cos(angle)
  }
  return { uniform, gaussian }
}
