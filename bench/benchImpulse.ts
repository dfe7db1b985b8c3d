/**
 * A cheap deterministic room-like impulse for the benchmark: a unit direct sound, then seeded
 * uniform noise under an exponential envelope (T60 = reverberationTimeS) 30 dB below it, over a
 * noise floor 85 dB down. One Float64Array, no FFT, so the generator adds nothing to peak memory.
 */
export function benchImpulse(sampleRateHz: number, durationS: number, reverberationTimeS = 0.6): Float64Array {
  const sampleCount = Math.round(sampleRateHz * durationS)
  const impulse = new Float64Array(sampleCount)
  const directSample = Math.round(0.003 * sampleRateHz)
  const decayPerSample = Math.exp((-3 * Math.LN10) / (reverberationTimeS * sampleRateHz))
  let state = 12345
  const noise = () => {
    // xorshift32: seeded and allocation-free
    state ^= state << 13
    state ^= state >>> 17
    state ^= state << 5
    return ((state >>> 0) / 4294967296 - 0.5) * Math.sqrt(12)
  }
  let envelope = Math.pow(10, -30 / 20)
  for (let n = 0; n < sampleCount; n++) {
    const tail = n > directSample ? envelope * noise() : 0
    if (n > directSample) envelope *= decayPerSample
    impulse[n] = tail + Math.pow(10, -85 / 20) * noise()
  }
  impulse[directSample] = 1
  return impulse
}
