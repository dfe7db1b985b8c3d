import FFT from 'fft.js'
import { DspInputError } from '../errors'
import { isPowerOfTwo } from './nextPowerOfTwo'

/**
 * Everything a real transform of one size needs, built once: the fft.js plan of half the size
 * (a real signal of N samples is packed into N/2 complex values), the twiddles W_N^k for
 * k = 0 … N/2 and two work buffers of N numbers.
 */
export interface RealFftPlan {
  size: number
  halfTransform: FFT
  /** cos(2πk/N), k = 0 … N/2. */
  twiddleCos: Float64Array
  /** sin(2πk/N), k = 0 … N/2. */
  twiddleSin: Float64Array
  /** Packed complex input (N numbers = N/2 complex). */
  packed: Float64Array
  /** Complex output of the half-size transform (N numbers). */
  transformed: Float64Array
}

/**
 * Plans are kept while their sizes add up to at most this many samples: one plan of N samples
 * holds about 4·N numbers (work buffers, twiddles, the fft.js table), so 2^21 caps the cache near
 * 64 MB — room for the 2^20 plan of a 10 s, 96 kHz response plus the small ones.
 */
const CACHE_BUDGET_SAMPLES = 1 << 21
const cache = new Map<number, RealFftPlan>()

function buildPlan(size: number): RealFftPlan {
  const half = size / 2
  const twiddleCos = new Float64Array(half + 1)
  const twiddleSin = new Float64Array(half + 1)
  for (let k = 0; k <= half; k++) {
    twiddleCos[k] = Math.cos((2 * Math.PI * k) / size)
    twiddleSin[k] = Math.sin((2 * Math.PI * k) / size)
  }
  return {
    size,
    halfTransform: new FFT(half),
    twiddleCos,
    twiddleSin,
    packed: new Float64Array(size),
    transformed: new Float64Array(size),
  }
}

/**
 * The cached plan for real transforms of `size` samples (a power of two ≥ 4). Plans are reused
 * across calls; the least recently used ones are dropped when the cache grows past its budget,
 * so one 2^21-point deconvolution does not pin memory for ever.
 * @throws DspInputError 'bad-fft-size' when size is not a power of two ≥ 4
 */
export function getRealFftPlan(size: number): RealFftPlan {
  const cached = cache.get(size)
  if (cached) {
    cache.delete(size)
    cache.set(size, cached)
    return cached
  }
  if (!isPowerOfTwo(size) || size < 4) {
    throw new DspInputError('bad-fft-size', `The FFT size must be a power of two of at least 4 (got ${size}).`)
  }
  const plan = buildPlan(size)
  cache.set(size, plan)
  let totalSamples = 0
  for (const key of cache.keys()) totalSamples += key
  for (const key of cache.keys()) {
    if (totalSamples <= CACHE_BUDGET_SAMPLES || key === size) break
    cache.delete(key)
    totalSamples -= key
  }
  return plan
}
