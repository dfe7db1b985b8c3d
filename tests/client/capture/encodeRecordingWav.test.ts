import { describe, expect, it } from 'vitest'
import { decodeWav } from '@shared/acoustics/wav/decodeWav'
import { assembleRecording } from '@/capture/assembleRecording'
import { encodeRecordingWav } from '@/capture/encodeRecordingWav'
import { expectWithin } from '../../helpers/tolerance'

const chunks = [Float32Array.from([0.5, -0.25]), Float32Array.from([0.125]), Float32Array.from([-1, 0.75, 0])]

describe('assembleRecording', () => {
  it('returns the blocks joined in order as Float64 when no length is given', () => {
    const joined = assembleRecording(chunks)

    expect(joined).toBeInstanceOf(Float64Array)
    expect(Array.from(joined)).toEqual([0.5, -0.25, 0.125, -1, 0.75, 0])
  })

  it('returns the first samples only when the recording ran past the wanted length', () => {
    expect(Array.from(assembleRecording(chunks, 4))).toEqual([0.5, -0.25, 0.125, -1])
  })

  it('returns zeros after the recording when it stopped short of the wanted length', () => {
    expect(Array.from(assembleRecording(chunks.slice(0, 1), 4))).toEqual([0.5, -0.25, 0, 0])
  })

  it('leaves the blocks untouched', () => {
    const block = Float32Array.from([0.1, 0.2])
    assembleRecording([block], 1)
    expect(Array.from(block)).toEqual([Float32Array.from([0.1])[0], Float32Array.from([0.2])[0]])
  })
})

describe('encodeRecordingWav', () => {
  it('returns a mono 24-bit PCM WAV at the context rate that decodes to the samples within one LSB', () => {
    const bytes = encodeRecordingWav(chunks, { sampleRateHz: 48_000, sampleCount: 5 })

    // RIFF/WAVE header (Microsoft RIFF specification): "RIFF" … "WAVE".
    expect(String.fromCharCode(...bytes.slice(0, 4))).toBe('RIFF')
    expect(String.fromCharCode(...bytes.slice(8, 12))).toBe('WAVE')
    const decoded = decodeWav(bytes)
    expect(decoded.sampleRateHz).toBe(48_000)
    expect(decoded.bitDepth).toBe(24)
    expect(decoded.channelCount).toBe(1)
    const samples = decoded.samples
    expect(samples.length).toBe(5)
    // 24-bit PCM: x·2^23 rounded, full scale clamped to 2^23 − 1, so each sample within 2^−23.
    ;[0.5, -0.25, 0.125, -1, 0.75].forEach((expected, i) => expectWithin(samples[i] as number, expected, 2 ** -23))
  })
})
