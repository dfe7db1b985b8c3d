/**
 * Hand-built WAV files for decoder tests (RIFF layout per the 1991 Multimedia Programming
 * Interface spec; WAVE_FORMAT_EXTENSIBLE per Microsoft's WAVEFORMATEXTENSIBLE: cbSize 22,
 * sub-format GUID whose first field is the format code).
 */
export function buildWavBytes(options: {
  formatCode: number
  bitsPerSample: number
  channelCount: number
  sampleRateHz: number
  /** Interleaved sample bytes as written into the data chunk. */
  data: Uint8Array
  isExtensible?: boolean
  /** Overrides the data chunk's declared size (to fake truncation). */
  declaredDataBytes?: number
}): Uint8Array {
  const { formatCode, bitsPerSample, channelCount, sampleRateHz, data, isExtensible = false } = options
  const fmtSize = isExtensible ? 40 : 16
  const bytes = new Uint8Array(12 + 8 + fmtSize + 8 + data.length)
  const view = new DataView(bytes.buffer)
  const text = (offset: number, value: string) => [...value].forEach((char, i) => view.setUint8(offset + i, char.charCodeAt(0)))
  const blockAlign = (bitsPerSample / 8) * channelCount
  text(0, 'RIFF')
  view.setUint32(4, bytes.length - 8, true)
  text(8, 'WAVE')
  text(12, 'fmt ')
  view.setUint32(16, fmtSize, true)
  view.setUint16(20, isExtensible ? 0xfffe : formatCode, true)
  view.setUint16(22, channelCount, true)
  view.setUint32(24, sampleRateHz, true)
  view.setUint32(28, sampleRateHz * blockAlign, true)
  view.setUint16(32, blockAlign, true)
  view.setUint16(34, bitsPerSample, true)
  if (isExtensible) {
    view.setUint16(36, 22, true)
    view.setUint16(38, bitsPerSample, true)
    view.setUint32(40, channelCount === 1 ? 4 : 3, true)
    view.setUint32(44, formatCode, true) // GUID Data1 = format code; rest of the KSDATAFORMAT GUID:
    ;[0x00, 0x00, 0x10, 0x00, 0x80, 0x00, 0x00, 0xaa, 0x00, 0x38, 0x9b, 0x71].forEach((value, i) => view.setUint8(48 + i, value))
  }
  const dataOffset = 20 + fmtSize
  text(dataOffset, 'data')
  view.setUint32(dataOffset + 4, options.declaredDataBytes ?? data.length, true)
  bytes.set(data, dataOffset + 8)
  return bytes
}

/** Interleaves channels into float32 / float64 / int32 little-endian bytes. */
export function interleave(channels: number[][], kind: 'float32' | 'float64' | 'int32'): Uint8Array {
  const size = kind === 'float64' ? 8 : 4
  const frames = channels[0]?.length ?? 0
  const bytes = new Uint8Array(frames * channels.length * size)
  const view = new DataView(bytes.buffer)
  for (let frame = 0; frame < frames; frame++) {
    channels.forEach((channel, c) => {
      const offset = (frame * channels.length + c) * size
      const value = channel[frame] as number
      if (kind === 'float32') view.setFloat32(offset, value, true)
      else if (kind === 'float64') view.setFloat64(offset, value, true)
      else view.setInt32(offset, Math.round(value * 2147483647), true)
    })
  }
  return bytes
}
