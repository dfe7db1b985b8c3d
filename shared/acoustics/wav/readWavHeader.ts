import { findChunkStart } from './findChunkStart'
import { WaveFile } from './waveFileClass'
import { WavDecodeError } from './wavDecodeError'

export type WavSampleFormat = 'pcm' | 'float'

/** Header facts of a WAV file, read without touching the samples. */
export interface WavFacts {
  sampleRateHz: number
  /** Container bits per sample (16, 24, 32, 64). */
  bitDepth: number
  channelCount: number
  frameCount: number
  format: WavSampleFormat
  durationS: number
}

/** Facts plus where the sample bytes are, for the decoder. */
export interface WavHeader extends WavFacts {
  dataStartByte: number
  isLittleEndian: boolean
}

interface FmtChunk {
  audioFormat: number
  numChannels: number
  sampleRate: number
  bitsPerSample: number
  blockAlign: number
  subformat?: number[]
}


const FORMAT_PCM = 1
const FORMAT_FLOAT = 3
const FORMAT_EXTENSIBLE = 0xfffe
export const MIN_SAMPLE_RATE_HZ = 22050
export const MAX_SAMPLE_RATE_HZ = 192000

function parseContainer(bytes: Uint8Array): InstanceType<typeof WaveFile> {
  const isRiff = bytes.length >= 12 && /^(RIFF|RIFX|RF64)$/.test(String.fromCharCode(...bytes.subarray(0, 4)))
  const isWave = isRiff && String.fromCharCode(...bytes.subarray(8, 12)) === 'WAVE'
  if (!isWave) throw new WavDecodeError('not-wav', 'This file is not a WAV file (no RIFF/WAVE header). Export the recording as WAV and upload it again.')
  const wav = new WaveFile()
  try {
    wav.fromBuffer(bytes, false)
  } catch {
    // wavefile also throws on codecs it cannot set up (e.g. 4-bit ADPCM): tell those apart.
    const isLittleEndian = !bytes.subarray(0, 4).every((byte, i) => byte === 'RIFX'.charCodeAt(i))
    const fmtStart = findChunkStart(bytes, 'fmt ', isLittleEndian)
    if (fmtStart !== null && fmtStart + 2 <= bytes.length) {
      const code = new DataView(bytes.buffer, bytes.byteOffset + fmtStart, 2).getUint16(0, isLittleEndian)
      if (code !== FORMAT_PCM && code !== FORMAT_FLOAT && code !== FORMAT_EXTENSIBLE) unsupported(`format code ${code}`)
    }
    throw new WavDecodeError('truncated', 'The WAV header is incomplete or corrupt (no usable "fmt " or "data" chunk). Export the file again.')
  }
  return wav
}

/** Sample format from the fmt chunk; WAVE_FORMAT_EXTENSIBLE carries it in the sub-format GUID's first field. */
function sampleFormatOf(fmt: FmtChunk): WavSampleFormat {
  const code = fmt.audioFormat === FORMAT_EXTENSIBLE ? fmt.subformat?.[0] : fmt.audioFormat
  const bits = fmt.bitsPerSample
  if (code === FORMAT_PCM && (bits === 16 || bits === 24 || bits === 32)) return 'pcm'
  if (code === FORMAT_FLOAT && (bits === 32 || bits === 64)) return 'float'
  unsupported(code === FORMAT_PCM ? `${bits}-bit PCM` : code === FORMAT_FLOAT ? `${bits}-bit float` : `format code ${code}`)
}

function unsupported(what: string): never {
  throw new WavDecodeError('unsupported-encoding', `This WAV uses ${what}; use 16/24/32-bit PCM or 32/64-bit float, uncompressed.`)
}

/**
 * Parses and checks a WAV header (RIFF/RIFX/RF64 via wavefile): container, fmt chunk, encoding,
 * sample rate (22.05–192 kHz) and the data chunk's declared size against the bytes present.
 * @param bytes the whole file, or its first bytes when `fileByteCount` gives the whole length (an
 *   upload checked while it streams); the header chunks must lie inside them
 * @throws WavDecodeError 'not-wav' | 'truncated' | 'unsupported-encoding' | 'unsupported-rate' | 'no-samples'
 */
export function readWavHeader(bytes: Uint8Array, fileByteCount = bytes.length): WavHeader {
  const wav = parseContainer(bytes)
  const fmt = wav.fmt as unknown as FmtChunk
  const isLittleEndian = wav.container !== 'RIFX'
  // wavefile resolves the declared size (also RF64's ds64 size); the offset comes from our own walk.
  const declaredDataBytes = (wav.data as { chunkSize: number }).chunkSize
  const dataStartByte = findChunkStart(bytes, 'data', isLittleEndian)
  const format = sampleFormatOf(fmt)
  if (dataStartByte === null || !(fmt.numChannels >= 1) || !(fmt.blockAlign >= 1)) {
    throw new WavDecodeError('truncated', 'The WAV header is incomplete or corrupt. Export the file again.')
  }
  if (!(fmt.sampleRate >= MIN_SAMPLE_RATE_HZ && fmt.sampleRate <= MAX_SAMPLE_RATE_HZ)) {
    throw new WavDecodeError('unsupported-rate', `The sample rate is ${fmt.sampleRate} Hz; use 22 050 Hz to 192 000 Hz.`)
  }
  const frameBytes = (fmt.bitsPerSample / 8) * fmt.numChannels
  if (declaredDataBytes > fileByteCount - dataStartByte) {
    throw new WavDecodeError('truncated', `The WAV file is truncated: its data chunk declares ${declaredDataBytes} bytes but only ${Math.max(0, fileByteCount - dataStartByte)} are present. Upload the complete file.`)
  }
  const frameCount = Math.floor(declaredDataBytes / frameBytes)
  if (frameCount === 0) throw new WavDecodeError('no-samples', 'The WAV file contains no samples.')
  return {
    sampleRateHz: fmt.sampleRate,
    bitDepth: fmt.bitsPerSample,
    channelCount: fmt.numChannels,
    frameCount,
    format,
    durationS: frameCount / fmt.sampleRate,
    dataStartByte,
    isLittleEndian,
  }
}
