import type { WavHeader } from './readWavHeader'

/**
 * One channel of the data chunk as Float64 in −1..1 (PCM scaled by 2^(bits−1); float as stored).
 * Reads straight from the bytes with a DataView: one pass over the chosen channel's frames,
 * no interleaved intermediate, no per-sample allocation.
 */
export function readChannelSamples(bytes: Uint8Array, header: WavHeader, channel: number): Float64Array {
  const { frameCount, channelCount, bitDepth, format, dataStartByte, isLittleEndian: le } = header
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength)
  const bytesPerSample = bitDepth / 8
  const frameBytes = bytesPerSample * channelCount
  const samples = new Float64Array(frameCount)
  let offset = dataStartByte + channel * bytesPerSample
  if (format === 'float' && bitDepth === 32) {
    for (let i = 0; i < frameCount; i++, offset += frameBytes) samples[i] = view.getFloat32(offset, le)
  } else if (format === 'float') {
    for (let i = 0; i < frameCount; i++, offset += frameBytes) samples[i] = view.getFloat64(offset, le)
  } else if (bitDepth === 16) {
    for (let i = 0; i < frameCount; i++, offset += frameBytes) samples[i] = view.getInt16(offset, le) / 32768
  } else if (bitDepth === 32) {
    for (let i = 0; i < frameCount; i++, offset += frameBytes) samples[i] = view.getInt32(offset, le) / 2147483648
  } else {
    for (let i = 0; i < frameCount; i++, offset += frameBytes) {
      const b0 = bytes[offset] as number
      const b1 = bytes[offset + 1] as number
      const b2 = bytes[offset + 2] as number
      const unsigned = le ? b0 | (b1 << 8) | (b2 << 16) : b2 | (b1 << 8) | (b0 << 16)
      // Sign-extend the 24-bit value through a 32-bit shift pair.
      samples[i] = ((unsigned << 8) >> 8) / 8388608
    }
  }
  return samples
}
