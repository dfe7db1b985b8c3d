import { describe, expect, it } from 'vitest'
import { readWavFacts } from '../../../../shared/acoustics/wav/readWavFacts'
import { encodeWav } from '../../../../shared/acoustics/wav/encodeWav'
import { WavDecodeError } from '../../../../shared/acoustics/wav/wavDecodeError'

// An upload is checked from its first bytes while it streams to storage; the whole length is
// known once it has arrived. The RIFF layout (1991 Multimedia Programming Interface spec) puts
// the fmt and data chunk headers at the front, so the facts must match those of the whole file.
describe('readWavFacts from the head of a file', () => {
  const samples = new Float64Array(48_000 * 3).map((_, n) => Math.sin(n / 10) * 0.5)
  const whole = encodeWav(samples, { sampleRateHz: 48_000, encoding: 'pcm24' })
  const head = whole.subarray(0, 4096)

  it('gives the facts of the whole file when told its full length', () => {
    expect(readWavFacts(head, whole.length)).toEqual(readWavFacts(whole))
    expect(readWavFacts(head, whole.length).durationS).toBeCloseTo(3, 9)
  })

  it('still reports truncation when the full length is short of the declared data', () => {
    let code: string | null = null
    try {
      readWavFacts(head, whole.length - 300)
    } catch (error) {
      code = error instanceof WavDecodeError ? error.code : 'other'
    }
    expect(code).toBe('truncated')
  })
})
