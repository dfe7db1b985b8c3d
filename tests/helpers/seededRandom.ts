/**
 * Seeded pseudo-random numbers for reproducible test signals: mulberry32 (32-bit state,
 * public-domain generator by T. Ettinger) for uniforms, Box–Muller for Gaussians.
 */
export function createSeededRandom(seed: number): { uniform: () => number; gaussian: () => number } {
  let state = seed >>> 0
  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0
    let t = state
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
  const gaussian = (): number => {
    const u1 = Math.max(uniform(), 1e-300)
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * uniform())
  }
  return { uniform, gaussian }
}
