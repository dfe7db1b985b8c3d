import { describe, expect, it } from 'vitest'
import { decodeWav } from '../../../../shared/acoustics/wav/decodeWav'
import { encodeWav, type WavEncoding } from '../../../../shared/acoustics/wav/encodeWav'
import { createSeededRandom } from '../../../../shared/acoustics/synthetic/seededRandom'
import { expectWithin } from '../../../helpers/tolerance'

const fs = 48000

function testSignal(seed: number, length = 4800): Float64Array {
  const random = createSeededRandom(seed)
  return Float64Array.from({ length }, () => 0.9 * (2 * random.uniform() - 1))
}

function largestError(a: Float64Array, b: Float64Array): number {
  let worst = 0
  for (let i = 0; i < a.length; i++) worst = Math.max(worst, Math.abs((a[i] as number) - (b[i] as number)))
  return worst
}

describe('encodeWav', () => {
  it.each([
    { encoding: 'pcm16' as WavEncoding, bits: 16, format: 'pcm', stepSize: 2 ** -15 },
    { encoding: 'pcm24' as WavEncoding, bits: 24, format: 'pcm', stepSize: 2 ** -23 },
    { encoding: 'pcm32' as WavEncoding, bits: 32, format: 'pcm', stepSize: 2 ** -31 },
    { encoding: 'float32' as WavEncoding, bits: 32, format: 'float', stepSize: 2 ** -24 },
  ])('returns bytes that decode to the same samples within half a step when encoding is $encoding', ({ encoding, bits, format, stepSize }) => {
    const samples = testSignal(bits)
    const decoded = decodeWav(encodeWav(samples, { sampleRateHz: fs, encoding }))
    expect(decoded.sampleRateHz).toBe(fs)
    expect(decoded.bitDepth).toBe(bits)
    expect(decoded.format).toBe(format)
    expect(decoded.samples.length).toBe(samples.length)
    // Rounding to the nearest code: error ≤ ½ LSB (float32: relative 2^−24 of values < 1).
    expect(largestError(decoded.samples, samples)).toBeLessThanOrEqual(stepSize / 2 + 1e-12)
  })

  it('returns a two-channel file whose channels decode separately', () => {
    const left = testSignal(1)
    const right = testSignal(2)
    const bytes = encodeWav([left, right], { sampleRateHz: 44100, encoding: 'pcm24' })
    const second = decodeWav(bytes, { channel: 1 })
    expect(second.channelCount).toBe(2)
    expectWithin(largestError(second.samples, right), 0, 2 ** -23)
  })

  it('returns full-scale codes clamped rather than wrapped when a sample reaches 1.0', () => {
    const decoded = decodeWav(encodeWav(new Float64Array([1, -1, 0.5]), { sampleRateHz: fs, encoding: 'pcm16' }))
    expectWithin(decoded.samples[0] as number, 32767 / 32768, 1e-12)
    expectWithin(decoded.samples[1] as number, -1, 1e-12)
  })

  it.each([
    { name: 'no samples', channels: new Float64Array(0), message: /no samples/ },
    { name: 'channels of unequal length', channels: [new Float64Array(3), new Float64Array(4)], message: /same number/ },
    { name: 'a NaN sample', channels: new Float64Array([0, Number.NaN]), message: /not a finite/ },
  ])('throws a DspInputError when given $name', ({ channels, message }) => {
    expect(() => encodeWav(channels, { sampleRateHz: fs })).toThrow(message)
  })
})
