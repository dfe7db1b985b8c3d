import { describe, expect, it } from 'vitest'
import { forwardRealFft } from '../../../../shared/acoustics/fft/forwardRealFft'
import { inverseRealFft } from '../../../../shared/acoustics/fft/inverseRealFft'
import { createSeededRandom } from '../../../../shared/acoustics/synthetic/seededRandom'
import { expectWithin } from '../../../helpers/tolerance'

function randomSignal(length: number, seed: number): Float64Array {
  const random = createSeededRandom(seed)
  return Float64Array.from({ length }, () => random.gaussian())
}

/** The DFT by its definition, X[k] = Σ x[n]·e^(−j2πkn/N): the closed form the FFT must reproduce. */
function directDft(signal: Float64Array, size: number, bin: number): { re: number; im: number } {
  let re = 0
  let im = 0
  for (let n = 0; n < signal.length; n++) {
    const angle = (-2 * Math.PI * bin * n) / size
    re += (signal[n] as number) * Math.cos(angle)
    im += (signal[n] as number) * Math.sin(angle)
  }
  return { re, im }
}

describe('forwardRealFft', () => {
  it.each([4, 8, 64, 1024])('returns the DFT definition for every bin when size is %i', (size) => {
    const signal = randomSignal(size, size)
    const spectrum = forwardRealFft(signal, { size })
    expect(spectrum.re.length).toBe(size / 2 + 1)
    for (let k = 0; k <= size / 2; k++) {
      const expected = directDft(signal, size, k)
      expectWithin(spectrum.re[k] as number, expected.re, 1e-9 * size)
      expectWithin(spectrum.im[k] as number, expected.im, 1e-9 * size)
    }
  })

  it('returns the zero-padded DFT when the input is shorter than the size', () => {
    const signal = randomSignal(100, 3)
    const spectrum = forwardRealFft(signal, { size: 256 })
    for (const k of [0, 1, 17, 64, 128]) {
      const expected = directDft(signal, 256, k)
      expectWithin(spectrum.re[k] as number, expected.re, 1e-9)
      expectWithin(spectrum.im[k] as number, expected.im, 1e-9)
    }
  })

  it('leaves its input untouched and fills a given output', () => {
    const signal = randomSignal(32, 4)
    const copy = signal.slice()
    const output = { size: 32, re: new Float64Array(17), im: new Float64Array(17) }
    const spectrum = forwardRealFft(signal, { size: 32, output })
    expect(spectrum).toBe(output)
    expect(Array.from(signal)).toEqual(Array.from(copy))
  })

  it('throws a DspInputError when the size is not a power of two', () => {
    expect(() => forwardRealFft(new Float64Array(6), { size: 6 })).toThrow(/power of two/)
  })
})

describe('inverseRealFft', () => {
  it.each([4, 16, 4096])('returns the original signal after a forward transform when size is %i', (size) => {
    const signal = randomSignal(size, 11 + size)
    const back = inverseRealFft(forwardRealFft(signal, { size }))
    let largestError = 0
    for (let n = 0; n < size; n++) largestError = Math.max(largestError, Math.abs((back[n] as number) - (signal[n] as number)))
    expectWithin(largestError, 0, 1e-12)
  })
})
