import { describe, expect, it } from 'vitest'
import { fftConvolve, fftCorrelate } from '../../../../shared/acoustics/fft/fftConvolve'
import { createSeededRandom } from '../../../../shared/acoustics/synthetic/seededRandom'
import { expectWithin } from '../../../helpers/tolerance'

/** Linear convolution by its definition y[n] = Σ a[m]·b[n − m]. */
function directConvolve(a: Float64Array, b: Float64Array): Float64Array {
  const y = new Float64Array(a.length + b.length - 1)
  for (let i = 0; i < a.length; i++) for (let j = 0; j < b.length; j++) y[i + j] = (y[i + j] as number) + (a[i] as number) * (b[j] as number)
  return y
}

describe('fftConvolve', () => {
  it('returns the direct linear convolution, with nothing wrapped around', () => {
    const random = createSeededRandom(5)
    const a = Float64Array.from({ length: 300 }, () => random.gaussian())
    const b = Float64Array.from({ length: 77 }, () => random.gaussian())
    const fast = fftConvolve(a, b)
    const direct = directConvolve(a, b)
    expect(fast.length).toBe(376)
    for (let n = 0; n < direct.length; n++) expectWithin(fast[n] as number, direct[n] as number, 1e-10)
  })

  it('returns a shifted copy when one input is a delayed unit impulse', () => {
    const signal = new Float64Array([1, -2, 3])
    const delayed = fftConvolve(signal, new Float64Array([0, 0, 1]))
    expect(Array.from(delayed, (v) => Math.round(v * 1e12) / 1e12)).toEqual([0, 0, 1, -2, 3])
  })

  it('throws a DspInputError when an input is empty', () => {
    expect(() => fftConvolve(new Float64Array(0), new Float64Array(3))).toThrow(/non-empty/)
  })
})

describe('fftCorrelate', () => {
  it('returns the peak at the lag of a delayed copy (lag 0 at index nb − 1)', () => {
    const random = createSeededRandom(9)
    const b = Float64Array.from({ length: 64 }, () => random.gaussian())
    const a = new Float64Array(200)
    a.set(b, 40)
    const r = fftCorrelate(a, b)
    let best = 0
    for (let i = 1; i < r.length; i++) if ((r[i] as number) > (r[best] as number)) best = i
    expect(best - (b.length - 1)).toBe(40)
  })
})
