/**
 * Joins recorded blocks (Float32, as the audio graph delivers them) into one Float64 signal for
 * the DSP code, cut or zero-padded to `sampleCount` when given.
 */
export function assembleRecording(chunks: readonly Float32Array[], sampleCount?: number): Float64Array {
  const recordedCount = chunks.reduce((sum, chunk) => sum + chunk.length, 0)
  const output = new Float64Array(sampleCount ?? recordedCount)
  let offset = 0
  for (const chunk of chunks) {
    if (offset >= output.length) break
    const take = Math.min(chunk.length, output.length - offset)
    for (let i = 0; i < take; i++) output[offset + i] = chunk[i] as number
    offset += take
  }
  return output
}
