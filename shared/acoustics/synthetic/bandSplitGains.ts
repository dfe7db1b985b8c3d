/** Half-width of the crossfade between neighbouring bands, octaves (common practice, no source). */
const CROSSFADE_HALF_WIDTH_OCTAVES = 1 / 6

/**
 * Amplitude gains g_b(f) that split the spectrum between bands with the given centres, power
 * complementary (Σ_b g_b² = 1 at every f): band b owns the frequencies between the geometric means
 * of its centre and its neighbours', with a cos/sin crossfade ±1/6 octave around each boundary
 * (in log2 f). The lowest band extends down to DC and the highest up to Nyquist.
 * @param centresHz - ascending band centres, Hz
 * @param output - reused result (length = band count), created when absent
 * @returns gain of each band at `frequencyHz`
 */
export function bandSplitGains(centresHz: readonly number[], frequencyHz: number, output?: Float64Array): Float64Array {
  const gains = output ?? new Float64Array(centresHz.length)
  gains.fill(0)
  if (centresHz.length === 1 || frequencyHz <= 0) {
    gains[0] = 1
    return gains
  }
  const octave = Math.log2(frequencyHz)
  let band = 0
  while (band < centresHz.length - 1 && octave > boundaryOctave(centresHz, band)) band++
  gains[band] = 1
  crossfade(gains, centresHz, band - 1, octave)
  crossfade(gains, centresHz, band, octave)
  return gains
}

/** log2 of the boundary between band b and b + 1 (geometric mean of their centres). */
function boundaryOctave(centresHz: readonly number[], band: number): number {
  return 0.5 * (Math.log2(centresHz[band] as number) + Math.log2(centresHz[band + 1] as number))
}

function crossfade(gains: Float64Array, centresHz: readonly number[], lowerBand: number, octave: number): void {
  if (lowerBand < 0 || lowerBand >= centresHz.length - 1) return
  const offset = octave - boundaryOctave(centresHz, lowerBand)
  if (Math.abs(offset) >= CROSSFADE_HALF_WIDTH_OCTAVES) return
  const angle = (Math.PI / 4) * (1 + offset / CROSSFADE_HALF_WIDTH_OCTAVES)
  gains[lowerBand] = Math.cos(angle)
  gains[lowerBand + 1] = Math.sin(angle)
}
