import { readWavHeader, type WavFacts } from './readWavHeader'

/**
 * Header facts of a WAV (rate, bits, channels, frames, format, duration) without decoding samples;
 * cheap enough to validate an upload before accepting it.
 * @param bytes the whole file, or its first bytes with `fileByteCount` the whole length
 * @throws WavDecodeError for a file {@link decodeWav} would reject on its header alone
 */
export function readWavFacts(bytes: Uint8Array, fileByteCount = bytes.length): WavFacts {
  const { sampleRateHz, bitDepth, channelCount, frameCount, format, durationS } = readWavHeader(bytes, fileByteCount)
  return { sampleRateHz, bitDepth, channelCount, frameCount, format, durationS }
}
