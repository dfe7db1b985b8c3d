/**
 * Byte offset of the first byte of a RIFF sub-chunk's body, or null when absent. Walks the
 * chunk list from byte 12 (id, 4-byte size, body padded to even length, RIFF 1991 spec).
 * wavefile parses the chunks but does not expose their offsets in its published build.
 */
export function findChunkStart(bytes: Uint8Array, chunkId: string, isLittleEndian: boolean): number | null {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength)
  let offset = 12
  while (offset + 8 <= bytes.length) {
    const id = String.fromCharCode(bytes[offset] as number, bytes[offset + 1] as number, bytes[offset + 2] as number, bytes[offset + 3] as number)
    if (id === chunkId) return offset + 8
    const size = view.getUint32(offset + 4, isLittleEndian)
    offset += 8 + size + (size % 2)
  }
  return null
}
