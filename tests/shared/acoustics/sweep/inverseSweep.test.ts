import { describe, expect, it } from 'vitest'
import { fftConvolve } from '../../../../shared/acoustics/fft/fftConvolve'
import { forwardRealFft } from '../../../../shared/acoustics/fft/forwardRealFft'
import { nextPowerOfTwo } from '../../../../shared/acoustics/fft/nextPowerOfTwo'
import { generateSweep } from '../../../../shared/acoustics/sweep/generateSweep'
import { inverseSweep } from '../../../../shared/acoustics/sweep/inverseSweep'
import { expectWithin } from '../../../helpers/tolerance'

const fs = 48000
const options = { f1Hz: 20, f2Hz: 20000, durationS: 3, sampleRateHz: fs }

describe('inverseSweep', () => {
  const { samples } = generateSweep(options)
  const product = fftConvolve(samples, inverseSweep(options))

  it('returns a filter whose product with the sweep peaks at N − 1 (a delayed delta; Farina 2000)', () => {
    let peak = 0
    for (let i = 1; i < product.length; i++) if (Math.abs(product[i] as number) > Math.abs(product[peak] as number)) peak = i
    expect(peak).toBe(samples.length - 1)
  })

  it('returns unit gain (0 dB ± 0.1) across the sweep band, inside the fades (ISO 18233 B.5)', () => {
    const size = nextPowerOfTwo(product.length)
    const spectrum = forwardRealFft(product, { size })
    for (let f = 40; f <= 10000; f *= 1.1) {
      const k = Math.round((f * size) / fs)
      const levelDb = 10 * Math.log10((spectrum.re[k] as number) ** 2 + (spectrum.im[k] as number) ** 2)
      expectWithin(levelDb, 0, 0.1)
    }
  })

  it('returns a product whose energy more than 20 ms from the peak is over 40 dB below the total', () => {
    const peak = samples.length - 1
    let total = 0
    let away = 0
    for (let i = 0; i < product.length; i++) {
      const energy = (product[i] as number) ** 2
      total += energy
      if (Math.abs(i - peak) > 0.02 * fs) away += energy
    }
    expect(10 * Math.log10(away / total)).toBeLessThan(-40)
  })

  it('returns a filter scaled for the played level: a −20 dBFS sweep still gives unit gain', () => {
    const quiet = { ...options, levelDb: -20 }
    const quietProduct = fftConvolve(generateSweep(quiet).samples, inverseSweep(quiet))
    expectWithin((quietProduct[samples.length - 1] as number) / (product[samples.length - 1] as number), 1, 1e-9)
  })
})
