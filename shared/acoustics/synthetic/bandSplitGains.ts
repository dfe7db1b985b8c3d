/** Half-width of the crossfade between neighbouring bands, octaves (common practice, no source). */
const CROSSFADE_HALF_WIDTH_OCTAVES = 1 / 6

/**
 * Amplitude gains g_b(f) that split a spectrum between bands with the given centres, power
 * complementary (Σ_b g_b² = 1 at every f): band b owns the frequencies between the geometric means
 * of its centre and its neighbours', with a cos/sin crossfade ±1/6 octave around each boundary
 * (in log2 f). The lowest band extends down to DC and the highest up to Nyquist.
 * @param centresHz - ascending band centres, Hz
 * @returns gains[b][k] for the frequencies k·binHz, k = 0 … binCount − 1
 */
export function bandSplitGains(centresHz: readonly number[], binHz: number, binCount: number): Float64Array[] {
  const gains = centresHz.map(() => new Float64Array(binCount))
  // log2 of the boundary between band b and b + 1 (geometric mean of their centres).
  const boundaries = centresHz.slice(1).map((centre, b) => 0.5 * (Math.log2(centresHz[b] as number) + Math.log2(centre)))
  let band = 0
  for (let k = 0; k < binCount; k++) {
    const octave = k === 0 ? -Infinity : Math.log2(k * binHz)
    while (band < boundaries.length && octave > (boundaries[band] as number)) band++
    ;(gains[band] as Float64Array)[k] = 1
    crossfade(gains, boundaries, band - 1, octave, k)
    crossfade(gains, boundaries, band, octave, k)
  }
  return gains
}

function crossfade(gains: Float64Array[], boundaries: readonly number[], lowerBand: number, octave: number, bin: number): void {
  if (lowerBand < 0 || lowerBand >= boundaries.length) return
  const offset = octave - (boundaries[lowerBand] as number)
  if (!(Math.abs(offset) < CROSSFADE_HALF_WIDTH_OCTAVES)) return
  const angle = (Math.PI / 4) * (1 + offset / CROSSFADE_HALF_WIDTH_OCTAVES)
  ;(gains[lowerBand] as Float64Array)[bin] = Math.cos(angle)
  ;(gains[lowerBand + 1] as Float64Array)[bin] = Math.sin(angle)
}
