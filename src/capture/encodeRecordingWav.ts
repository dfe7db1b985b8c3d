import { encodeWav } from '@shared/acoustics/wav/encodeWav'
import { assembleRecording } from './assembleRecording'

export interface EncodeRecordingOptions {
  /** The audio context's rate, Hz (a whole number). */
  sampleRateHz: number
  /** Samples kept; the recording is cut or zero-padded to it. Default: all recorded. */
  sampleCount?: number
}

/**
 * A mono 24-bit PCM WAV of the recorded blocks: 24 bits keep the converter's noise, not the
 * file's, as the floor of the decay (16 bits would floor it near −98 dBFS).
 */
export function encodeRecordingWav(chunks: readonly Float32Array[], options: EncodeRecordingOptions): Uint8Array {
  const samples = assembleRecording(chunks, options.sampleCount)
  return encodeWav(samples, { sampleRateHz: Math.round(options.sampleRateHz), encoding: 'pcm24' })
}
