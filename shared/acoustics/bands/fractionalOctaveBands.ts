/** One IEC 61260-1 fractional-octave band. */
export interface Band {
  /** Nominal mid-band frequency (the label), Hz. */
  nominalHz: number
  /** Exact base-10 mid-band frequency f_m, Hz. */
  exactCentreHz: number
  /** Lower band edge f1, Hz. */
  lowerEdgeHz: number
  /** Upper band edge f2, Hz. */
  upperEdgeHz: number
  /** f2 − f1, Hz. */
  bandwidthHz: number
}

export type BandsPerOctave = 1 | 3

export interface FractionalOctaveBandsOptions {
  bandsPerOctave: BandsPerOctave
  /** Lowest nominal centre to include, Hz. Default 63 (octave) or 50 (third). */
  minNominalHz?: number
  /** Highest nominal centre to include, Hz. Default 8000 / 10000, or wider when sampleRateHz allows. */
  maxNominalHz?: number
  /** If given, bands whose upper edge reaches 0.45·fs are dropped, and the default top is raised. */
  sampleRateHz?: number
}

/** IEC 61260-1:2014 Eq. (1): base-10 octave ratio G = 10^(3/10). */
export const OCTAVE_RATIO = Math.pow(10, 0.3)
/** IEC 61260-1:2014 5.2: reference frequency f_r, Hz. */
export const REFERENCE_FREQUENCY_HZ = 1000
/** Highest nominal band we ever offer (top of IEC 61260-1 Annex E audio range), Hz. */
const TOP_NOMINAL_HZ = 20000
/** Upper band edge must stay below this fraction of fs (keeps bilinear warping small). */
const MAX_EDGE_FRACTION_OF_FS = 0.45
/** Preferred-number mantissas of the third-octave nominal series (IEC 61260-1 Annex E, R10). */
const R10 = [1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8]

/**
 * Nominal label of third-octave index x (x = 0 is 1 kHz): R10 mantissa × decade.
 * 25 Hz is x = −16, 20 kHz is x = +13 (IEC 61260-1 Annex E).
 */
function thirdOctaveNominalHz(x: number): number {
  const mantissa = R10[((x % 10) + 10) % 10] as number
  return mantissa * Math.pow(10, 3 + Math.floor(x / 10))
}

function bandAtIndex(x: number, bandsPerOctave: BandsPerOctave): Band {
  // IEC 61260-1 Eq. (2) (odd b): f_m = f_r·G^(x/b); Eqs. (4), (5): f1,2 = f_m·G^(∓1/(2b)).
  const exactCentreHz = REFERENCE_FREQUENCY_HZ * Math.pow(OCTAVE_RATIO, x / bandsPerOctave)
  const halfBandRatio = Math.pow(OCTAVE_RATIO, 1 / (2 * bandsPerOctave))
  const lowerEdgeHz = exactCentreHz / halfBandRatio
  const upperEdgeHz = exactCentreHz * halfBandRatio
  const nominalHz = thirdOctaveNominalHz(bandsPerOctave === 1 ? 3 * x : x)
  return { nominalHz, exactCentreHz, lowerEdgeHz, upperEdgeHz, bandwidthHz: upperEdgeHz - lowerEdgeHz }
}

/**
 * IEC 61260-1:2014 base-10 octave or third-octave bands between two nominal centres.
 *
 * f_m = 1000·G^(x/b), G = 10^0.3; edges f_m·G^(∓1/(2b)); labels from the Annex E nominal series.
 * Defaults: octave 63 Hz–8 kHz, third-octave 50 Hz–10 kHz; with `sampleRateHz` and no explicit
 * maximum the top is raised up to 20 kHz while the upper edge stays below 0.45·fs (common practice:
 * room for the filter skirt below Nyquist).
 *
 * @returns bands in ascending order (may be empty).
 * @see IEC 61260-1:2014 5.2–5.4, Eqs. (1)–(5), Annex E.
 */
export function fractionalOctaveBands(options: FractionalOctaveBandsOptions): Band[] {
  const { bandsPerOctave, sampleRateHz } = options
  const minNominalHz = options.minNominalHz ?? (bandsPerOctave === 1 ? 63 : 50)
  const defaultMaxHz = sampleRateHz === undefined ? (bandsPerOctave === 1 ? 8000 : 10000) : TOP_NOMINAL_HZ
  const maxNominalHz = options.maxNominalHz ?? defaultMaxHz
  const edgeLimitHz = sampleRateHz === undefined ? Infinity : MAX_EDGE_FRACTION_OF_FS * sampleRateHz
  const bands: Band[] = []
  // x range covers 10 Hz … 100 kHz nominal; the filter below selects.
  const first = bandsPerOctave === 1 ? -7 : -20
  const last = bandsPerOctave === 1 ? 7 : 20
  for (let x = first; x <= last; x++) {
    const band = bandAtIndex(x, bandsPerOctave)
    const isInRange = band.nominalHz >= minNominalHz * 0.999 && band.nominalHz <= maxNominalHz * 1.001
    if (isInRange && band.upperEdgeHz < edgeLimitHz) bands.push(band)
  }
  return bands
}
