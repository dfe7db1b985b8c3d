import type { BandResult } from '@shared/types/analysis'

type MidBandParameter = 'T20' | 'T30' | 'EDT' | 'C50' | 'C80' | 'D50' | 'Ts'

/** Lowest and highest band centre counted as mid-band, Hz: the 500 Hz and 1 kHz octaves (or their thirds 400 Hz – 1.25 kHz). */
const MID_BAND_RANGE_HZ: [number, number] = [355, 1413]

/**
 * Mid-band value of a parameter: the arithmetic mean over the 500 Hz and 1 kHz octave bands, or
 * over the six third-octave bands 400 Hz – 1.25 kHz of a third-octave analysis (ISO 3382-1:2009
 * Annex A single-number average over 500 + 1000 Hz, from memory — verify; the server's capture
 * headline uses the same bands). Null values are left out.
 */
export function midBandMean(bands: readonly BandResult[], parameter: MidBandParameter): number | null {
  const values = bands
    .filter((band) => band.centreHz >= MID_BAND_RANGE_HZ[0] && band.centreHz <= MID_BAND_RANGE_HZ[1])
    .map((band) => band[parameter])
    .filter((value): value is number => value !== null && Number.isFinite(value))
  return values.length === 0 ? null : values.reduce((sum, value) => sum + value, 0) / values.length
}
