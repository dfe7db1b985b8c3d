import { statSync, writeFileSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { fftConvolve } from '../shared/acoustics/fft/fftConvolve'
import { generateSweep } from '../shared/acoustics/sweep/generateSweep'
import { synthesizeRoomImpulse, type SynthesizeRoomImpulseOptions } from '../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { encodeWav, type WavEncoding } from '../shared/acoustics/wav/encodeWav'

// Writes the small demo and test WAVs described in samples/README.md. Deterministic: every
// random number comes from a fixed seed, so re-running reproduces the same bytes.
const directory = dirname(fileURLToPath(import.meta.url))
const OCTAVES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000]
/** T60 per octave band (63 Hz … 8 kHz), s: a small untreated room and the same room treated. */
export const SMALL_ROOM_T60_S = [0.55, 0.45, 0.4, 0.38, 0.35, 0.33, 0.3, 0.25]
export const TREATED_ROOM_T60_S = [0.45, 0.32, 0.25, 0.22, 0.2, 0.2, 0.19, 0.17]
/** The sweep played for the sweep-recording sample (see README). */
export const SAMPLE_SWEEP = { f1Hz: 20, f2Hz: 20000, durationS: 2, leadingSilenceS: 0.25, trailingSilenceS: 1, levelDb: -6 }

function room(seed: number, t60S: number[], overrides: Partial<SynthesizeRoomImpulseOptions> = {}): Float64Array {
  return synthesizeRoomImpulse({
    sampleRateHz: 48000,
    durationS: 1,
    seed,
    noiseFloorDb: -85,
    directDelayMs: 3,
    bandDecays: OCTAVES_HZ.map((centreHz, i) => ({ centreHz, T60S: t60S[i] as number })),
    ...overrides,
  })
}

function scaleToPeak(signal: Float64Array, peakDb: number): Float64Array {
  const peak = signal.reduce((max, v) => Math.max(max, Math.abs(v)), 0)
  const gain = Math.pow(10, peakDb / 20) / peak
  return signal.map((v) => v * gain)
}

function write(name: string, channels: Float64Array | Float64Array[], sampleRateHz: number, encoding: WavEncoding): void {
  const path = join(directory, name)
  writeFileSync(path, encodeWav(channels, { sampleRateHz, encoding }))
  process.stdout.write(`${name}  ${(statSync(path).size / 1024).toFixed(0)} KiB\n`)
}

const smallRoom = room(1001, SMALL_ROOM_T60_S, {
  reflections: [
    { delayMs: 2.9, gainDb: -4 },
    { delayMs: 5.1, gainDb: -7 },
  ],
})
write('small-room-ir.wav', smallRoom, 48000, 'pcm24')
write('treated-room-ir.wav', room(1002, TREATED_ROOM_T60_S, { reflections: [{ delayMs: 2.9, gainDb: -12 }, { delayMs: 5.1, gainDb: -15 }] }), 48000, 'pcm24')

const { samples: sweep } = generateSweep({ ...SAMPLE_SWEEP, sampleRateHz: 48000 })
write('sweep-reference.wav', sweep, 48000, 'pcm24')
// What a microphone in the small room would record: the sweep file convolved with its response,
// cut to the file's length and scaled to −3 dBFS peak so it does not clip.
write('small-room-sweep-recording.wav', scaleToPeak(fftConvolve(sweep, smallRoom).slice(0, sweep.length), -3), 48000, 'pcm24')

const stereoOptions = { sampleRateHz: 44100, durationS: 0.6 }
write('stereo-pair-ir.wav', [room(1003, SMALL_ROOM_T60_S, stereoOptions), room(1004, SMALL_ROOM_T60_S, { ...stereoOptions, directDelayMs: 3.4 })], 44100, 'pcm16')
