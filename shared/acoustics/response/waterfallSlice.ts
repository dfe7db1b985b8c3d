/**
 * The waterfall's slice window: a half-Hann rise over `riseSamples`, flat, then a half-Hann fall
 * over the second half of the length (common practice, no source).
 */
export function waterfallWindow(length: number, riseSamples: number): Float64Array {
  const window = new Float64Array(length).fill(1)
  for (let i = 0; i < riseSamples; i++) window[i] = 0.5 * (1 - Math.cos((Math.PI * (i + 0.5)) / riseSamples))
  const fallStart = Math.floor(length / 2)
  const fallLength = length - fallStart
  for (let i = fallStart; i < length; i++) {
    window[i] = 0.5 * (1 + Math.cos((Math.PI * (i - fallStart + 0.5)) / fallLength))
  }
  return window
}

/**
 * |X(f)|² of one windowed slice at arbitrary frequencies by direct DFT,
 * X(f) = Σ_n w[n]·x[start + n]·e^(−j2πfn/fs) (exact at every grid frequency, no bin interpolation).
 * Samples past the end of `signal` count as zero.
 */
export function slicePowerSpectrum(
  signal: Float64Array,
  options: { startIndex: number; window: Float64Array; frequencyHz: readonly number[]; sampleRateHz: number },
): Float64Array {
  const { startIndex, window, frequencyHz, sampleRateHz } = options
  const length = Math.min(window.length, signal.length - startIndex)
  const windowed = new Float64Array(length)
  for (let n = 0; n < length; n++) windowed[n] = (window[n] as number) * (signal[startIndex + n] as number)
  const power = new Float64Array(frequencyHz.length)
  for (let i = 0; i < frequencyHz.length; i++) {
    // Phasor recurrence e^(−jωn): one complex multiply per sample instead of cos and sin.
    const omega = (2 * Math.PI * (frequencyHz[i] as number)) / sampleRateHz
    const stepRe = Math.cos(omega)
    const stepIm = -Math.sin(omega)
    let phasorRe = 1
    let phasorIm = 0
    let sumRe = 0
    let sumIm = 0
    for (let n = 0; n < length; n++) {
      const x = windowed[n] as number
      sumRe += x * phasorRe
      sumIm += x * phasorIm
      const nextRe = phasorRe * stepRe - phasorIm * stepIm
      phasorIm = phasorRe * stepIm + phasorIm * stepRe
      phasorRe = nextRe
    }
    power[i] = sumRe * sumRe + sumIm * sumIm
  }
  return power
}
