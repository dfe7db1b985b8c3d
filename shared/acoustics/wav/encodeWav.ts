import { DspInputError } from '../errors'
import { WaveFile } from './waveFileClass'

export type WavEncoding = 'pcm16' | 'pcm24' | 'pcm32' | 'float32'

export interface EncodeWavOptions {
  sampleRateHz: number
  /** Sample format. Default 'pcm24'. */
  encoding?: WavEncoding
}

const BIT_DEPTH_CODES: Record<WavEncoding, string> = { pcm16: '16', pcm24: '24', pcm32: '32', float32: '32f' }
const PCM_BITS: Partial<Record<WavEncoding, number>> = { pcm16: 16, pcm24: 24, pcm32: 32 }

/**
 * Encodes samples (−1 … 1 = full scale) as a RIFF/WAVE file with the wavefile package: PCM
 * 16/24/32-bit (value·2^(b−1), rounded, clamped to [−2^(b−1), 2^(b−1) − 1], no dither) or IEEE
 * float 32-bit. Pure: returns bytes, writes nothing.
 * @param channels - one Float64Array (mono) or one per channel, all the same length
 * @returns the whole file
 * @throws DspInputError on no samples, unequal channel lengths, non-finite samples or a bad rate
 */
export function encodeWav(channels: Float64Array | Float64Array[], options: EncodeWavOptions): Uint8Array {
  const { sampleRateHz, encoding = 'pcm24' } = options
  const list = Array.isArray(channels) ? channels : [channels]
  if (!(Number.isInteger(sampleRateHz) && sampleRateHz > 0)) {
    throw new DspInputError('bad-sample-rate', `A WAV file needs a whole, positive sample rate (got ${sampleRateHz}).`)
  }
  const first = list[0]
  if (first === undefined || first.length === 0) throw new DspInputError('no-samples', 'There are no samples to write.')
  if (list.some((channel) => channel.length !== first.length)) {
    throw new DspInputError('bad-channels', 'All channels must have the same number of samples.')
  }
  const bits = PCM_BITS[encoding]
  const converted = list.map((channel) => (bits === undefined ? checkedFloats(channel) : toIntegers(channel, bits)))
  const file = new WaveFile()
  file.fromScratch(list.length, sampleRateHz, BIT_DEPTH_CODES[encoding], list.length === 1 ? (converted[0] as ArrayLike<number>) : converted)
  return file.toBuffer()
}

function checkedFloats(channel: Float64Array): Float64Array {
  for (let i = 0; i < channel.length; i++) {
    if (!Number.isFinite(channel[i] as number)) throw new DspInputError('non-finite', `Sample ${i} is not a finite number.`)
  }
  return channel
}

function toIntegers(channel: Float64Array, bits: number): Float64Array {
  const scale = Math.pow(2, bits - 1)
  const integers = new Float64Array(channel.length)
  for (let i = 0; i < channel.length; i++) {
    const value = channel[i] as number
    if (!Number.isFinite(value)) throw new DspInputError('non-finite', `Sample ${i} is not a finite number.`)
    integers[i] = Math.max(-scale, Math.min(scale - 1, Math.round(value * scale)))
  }
  return integers
}
