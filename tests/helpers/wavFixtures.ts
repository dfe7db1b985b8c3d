import wavefile from 'wavefile'
import { createSeededRandom } from '../../shared/acoustics/synthetic/seededRandom'

const { WaveFile } = wavefile

/** A decaying noise burst as a WAV (seeded, so every run writes the same bytes). */
export function decayingNoiseWav(options: { sampleRateHz?: number; durationS?: number; bitDepth?: '8' | '16' | '24' | '32f'; t60S?: number; seed?: number } = {}): Uint8Array {
  const { sampleRateHz = 48_000, durationS = 1, bitDepth = '16', t60S = 0.4, seed = 7 } = options
  const count = Math.round(sampleRateHz * durationS)
  const { uniform: random } = createSeededRandom(seed)
  const samples = new Float64Array(count)
  const decayPerSample = Math.log(1000) / (t60S * sampleRateHz) // −60 dB amplitude at t60
  for (let i = 0; i < count; i++) samples[i] = 0.5 * (random() * 2 - 1) * Math.exp(-decayPerSample * i)
  const wav = new WaveFile()
  if (bitDepth === '32f') {
    wav.fromScratch(1, sampleRateHz, '32f', Float64Array.from(samples))
  } else if (bitDepth === '8') {
    wav.fromScratch(1, sampleRateHz, '8', Array.from(samples, (v) => Math.round(128 + v * 127)))
  } else {
    const full = bitDepth === '16' ? 32767 : 8388607
    wav.fromScratch(1, sampleRateHz, bitDepth, Array.from(samples, (v) => Math.round(v * full)))
  }
  return wav.toBuffer()
}
