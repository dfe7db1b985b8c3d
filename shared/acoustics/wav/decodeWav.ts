import type { AnalysisWarning } from '../../types/analysis'
import { detectSignalWarnings } from './detectSignalWarnings'
import { readChannelSamples } from './readChannelSamples'
import { readWavHeader, type WavSampleFormat } from './readWavHeader'
import { WavDecodeError } from './wavDecodeError'

export interface DecodeWavOptions {
  /** 0-based channel to return. Default 0. */
  channel?: number
  /** Reject files shorter than this, s (the analysis asked for decides). Default 0. */
  minDurationS?: number
}

export interface DecodedWav {
  sampleRateHz: number
  channelCount: number
  bitDepth: number
  format: WavSampleFormat
  durationS: number
  /** The chosen channel, −1..1 (float files may exceed it). */
  samples: Float64Array
  warnings: AnalysisWarning[]
}

function checkSamples(samples: Float64Array, channel: number): void {
  let isAllZero = true
  for (let i = 0; i < samples.length; i++) {
    const value = samples[i] as number
    if (!Number.isFinite(value)) {
      throw new WavDecodeError('non-finite', `Channel ${channel} contains NaN or infinite samples (first at sample ${i}); the file is damaged.`)
    }
    if (value !== 0) isAllZero = false
  }
  if (isAllZero) throw new WavDecodeError('all-zero', `Channel ${channel} is silent (all samples are zero); check the input channel and the recording level.`)
}

/**
 * Decodes one channel of a WAV file: PCM 16/24/32-bit, IEEE float 32/64-bit, plain or
 * WAVE_FORMAT_EXTENSIBLE, any channel count, 22.05–192 kHz. Container parsing by wavefile;
 * samples converted once to Float64. Clipping and DC offset are warnings, not errors.
 * @param bytes the whole file
 * @throws WavDecodeError with codes 'not-wav', 'truncated', 'unsupported-encoding', 'no-samples',
 *   'unsupported-rate', 'bad-channel', 'non-finite', 'all-zero', 'too-short'
 */
export function decodeWav(bytes: Uint8Array, options: DecodeWavOptions = {}): DecodedWav {
  const { channel = 0, minDurationS = 0 } = options
  const header = readWavHeader(bytes)
  if (!Number.isInteger(channel) || channel < 0 || channel >= header.channelCount) {
    throw new WavDecodeError('bad-channel', `Channel ${channel} does not exist; this file has ${header.channelCount} channel(s), numbered from 0.`)
  }
  if (header.durationS < minDurationS) {
    throw new WavDecodeError('too-short', `The file lasts ${header.durationS.toFixed(3)} s; the analysis needs at least ${minDurationS} s.`)
  }
  const samples = readChannelSamples(bytes, header, channel)
  checkSamples(samples, channel)
  return {
    sampleRateHz: header.sampleRateHz,
    channelCount: header.channelCount,
    bitDepth: header.bitDepth,
    format: header.format,
    durationS: header.durationS,
    samples,
    warnings: detectSignalWarnings(samples),
  }
}
