import { describe, expect, it } from 'vitest'
import { decodeWav } from '../../../../shared/acoustics/wav/decodeWav'
import { encodeWav, type WavEncoding } from '../../../../shared/acoustics/wav/encodeWav'
import { readWavFacts } from '../../../../shared/acoustics/wav/readWavFacts'
import { WavDecodeError } from '../../../../shared/acoustics/wav/wavDecodeError'
import { DspInputError } from '../../../../shared/acoustics/errors'
import { expectWithin } from '../../../helpers/tolerance'
import { buildWavBytes, interleave } from './buildWavBytes'

// Four whole periods, so the mean is zero (no DC-offset warning).
const ramp = Array.from({ length: 200 }, (_, i) => Math.sin((2 * Math.PI * i) / 50) * 0.5)

function expectCode(run: () => unknown, code: string): void {
  try {
    run()
  } catch (error) {
    expect(error).toBeInstanceOf(WavDecodeError)
    expect(error).toBeInstanceOf(DspInputError)
    expect((error as WavDecodeError).code).toBe(code)
    return
  }
  throw new Error(`expected a WavDecodeError '${code}'`)
}

describe('decodeWav', () => {
  it('round-trips 16/24/32-bit PCM and 32-bit float within half a quantisation step', () => {
    const steps: Record<WavEncoding, number> = { pcm16: 2 ** -15, pcm24: 2 ** -23, pcm32: 2 ** -31, float32: 2 ** -24 }
    for (const [encoding, step] of Object.entries(steps) as [WavEncoding, number][]) {
      const decoded = decodeWav(encodeWav(new Float64Array(ramp), { sampleRateHz: 48000, encoding }))
      expect(decoded.format).toBe(encoding === 'float32' ? 'float' : 'pcm')
      expect(decoded.bitDepth).toBe(encoding === 'pcm16' ? 16 : encoding === 'pcm24' ? 24 : 32)
      ramp.forEach((value, i) => expectWithin(decoded.samples[i] as number, value, step))
    }
  })

  it('reads 64-bit float, WAVE_FORMAT_EXTENSIBLE (PCM and float) and picks the asked channel', () => {
    const left = ramp
    const right = ramp.map((value) => -value / 2)
    const float64 = buildWavBytes({ formatCode: 3, bitsPerSample: 64, channelCount: 2, sampleRateHz: 96000, data: interleave([left, right], 'float64') })
    const decoded = decodeWav(float64, { channel: 1 })
    expect([decoded.channelCount, decoded.bitDepth, decoded.format, decoded.sampleRateHz]).toEqual([2, 64, 'float', 96000])
    right.forEach((value, i) => expectWithin(decoded.samples[i] as number, value, 1e-15))
    const extensibleFloat = buildWavBytes({ formatCode: 3, bitsPerSample: 32, channelCount: 2, sampleRateHz: 44100, data: interleave([left, right], 'float32'), isExtensible: true })
    expectWithin(decodeWav(extensibleFloat).samples[10] as number, left[10] as number, 1e-7)
    const extensiblePcm = buildWavBytes({ formatCode: 1, bitsPerSample: 32, channelCount: 2, sampleRateHz: 192000, data: interleave([left, right], 'int32'), isExtensible: true })
    expectWithin(decodeWav(extensiblePcm, { channel: 1 }).samples[10] as number, right[10] as number, 1e-9)
    expect(readWavFacts(extensiblePcm)).toEqual({ sampleRateHz: 192000, bitDepth: 32, channelCount: 2, frameCount: 200, format: 'pcm', durationS: 200 / 192000 })
  })

  it('throws typed errors for unusable files', () => {
    const pcm16 = encodeWav(new Float64Array(ramp), { sampleRateHz: 48000, encoding: 'pcm16' })
    expectCode(() => decodeWav(new TextEncoder().encode('hello, this is not audio')), 'not-wav')
    expectCode(() => decodeWav(pcm16.subarray(0, 30)), 'truncated')
    expectCode(() => decodeWav(pcm16.subarray(0, pcm16.length - 100)), 'truncated')
    expectCode(() => decodeWav(buildWavBytes({ formatCode: 1, bitsPerSample: 8, channelCount: 1, sampleRateHz: 48000, data: new Uint8Array(100).fill(128) })), 'unsupported-encoding')
    expectCode(() => decodeWav(buildWavBytes({ formatCode: 2, bitsPerSample: 4, channelCount: 1, sampleRateHz: 48000, data: new Uint8Array(100) })), 'unsupported-encoding')
    expectCode(() => decodeWav(buildWavBytes({ formatCode: 1, bitsPerSample: 16, channelCount: 1, sampleRateHz: 48000, data: new Uint8Array(0) })), 'no-samples')
    expectCode(() => decodeWav(encodeWav(new Float64Array(ramp), { sampleRateHz: 16000 })), 'unsupported-rate')
    expectCode(() => decodeWav(pcm16, { channel: 1 }), 'bad-channel')
    expectCode(() => decodeWav(encodeWav(new Float64Array(300), { sampleRateHz: 48000 })), 'all-zero')
    expectCode(() => decodeWav(buildWavBytes({ formatCode: 3, bitsPerSample: 32, channelCount: 1, sampleRateHz: 48000, data: interleave([[0.1, NaN, 0.2]], 'float32') })), 'non-finite')
    expectCode(() => decodeWav(pcm16, { minDurationS: 1 }), 'too-short')
  })

  it('warns (does not fail) on clipping and DC offset', () => {
    const clipped = new Float64Array(ramp.map((value) => Math.max(-1, Math.min(1, value * 4))))
    expect(decodeWav(encodeWav(clipped, { sampleRateHz: 48000 })).warnings.map((warning) => warning.code)).toEqual(['clipping'])
    const offset = new Float64Array(ramp.map((value) => value * 0.1 + 0.01))
    expect(decodeWav(encodeWav(offset, { sampleRateHz: 48000 })).warnings.map((warning) => warning.code)).toEqual(['dc-offset'])
    expect(decodeWav(encodeWav(new Float64Array(ramp), { sampleRateHz: 48000 })).warnings).toEqual([])
  })
})
