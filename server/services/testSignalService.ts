import { generateSweep } from '../../shared/acoustics/sweep/generateSweep'
import { encodeWav } from '../../shared/acoustics/wav/encodeWav'

export interface SweepRequest {
  f1: number
  f2: number
  seconds: number
  rate: number
  levelDb: number
}

/** Half a second of silence before the sweep and two after it, for the room's decay to be recorded. */
const LEADING_SILENCE_S = 0.5
const TRAILING_SILENCE_S = 2

/** The product's test sweep as a 24-bit WAV, with a file name that records its parameters. */
export function renderSweepWav(request: SweepRequest): { bytes: Uint8Array; fileName: string } {
  const { samples } = generateSweep({
    f1Hz: request.f1,
    f2Hz: request.f2,
    durationS: request.seconds,
    sampleRateHz: request.rate,
    levelDb: request.levelDb,
    leadingSilenceS: LEADING_SILENCE_S,
    trailingSilenceS: TRAILING_SILENCE_S,
  })
  const bytes = encodeWav(samples, { sampleRateHz: request.rate, encoding: 'pcm24' })
  const fileName = `ringdown-sweep-${request.f1}-${request.f2}Hz-${request.seconds}s-${request.rate}.wav`
  return { bytes, fileName }
}
