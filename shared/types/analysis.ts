/**
 * The JSON shape of one analysis result, as produced by `shared/acoustics/analyseCapture` and
 * stored by the worker, served by the server and drawn by the client. Bump
 * `ANALYSIS_SCHEMA_VERSION` on any breaking change so stored results can be told apart.
 */
export const ANALYSIS_SCHEMA_VERSION = 1

export type BandResolution = 'octave' | 'third'
export type CaptureKind = 'impulse' | 'sweep'
/** 1 = 1/1 octave … 48 = 1/48 octave. */
export type SmoothingFraction = 1 | 3 | 6 | 12 | 24 | 48

/** A validity flag per ISO 3382-2; never hides the value it qualifies. */
export interface AnalysisWarning {
  code:
    | 'decay-range-t20' // less than 35 dB usable decay (ISO 3382-1 5.3.3)
    | 'decay-range-t30' // less than 45 dB
    | 'decay-range-edt' // less than 25 dB
    | 'bandwidth-time-product' // B·T below 16 (forward) or 4 (time-reversed), ISO 3382-2 7.3
    | 'curvature' // C = 100·(T30/T20 − 1) above 10 %, ISO 3382-2 B.3
    | 'poor-fit' // r² of the regression below 0.95 (common practice)
    | 'no-decay' // nothing to fit
    | 'clipping'
    | 'dc-offset'
    | 'low-snr'
  /** Which parameter(s) the warning qualifies, e.g. ['T30']. Empty = the whole band. */
  parameters: string[]
  message: string
}

export interface DecayParameters {
  /** Reverberation times, s; null where they cannot be computed. */
  T20: number | null
  T30: number | null
  EDT: number | null
  /** Clarity, dB. */
  C50: number | null
  C80: number | null
  /** Definition, 0..1. */
  D50: number | null
  /** Centre time, s. */
  Ts: number | null
  /** Usable decay range from the peak of the Schroeder curve to the noise floor, dB. */
  decayRangeDb: number | null
  /** Impulse-to-noise ratio of the band, dB. */
  peakToNoiseDb: number | null
  /** ISO 3382-2 Annex B.3 curvature, %. */
  curvaturePercent: number | null
  /** Standard uncertainty σ(T20), σ(T30) from ISO 3382-2 Annex A, s. */
  uncertaintyT20: number | null
  uncertaintyT30: number | null
  /** r² of the T20 / T30 / EDT regressions. */
  fitR2: { T20: number | null; T30: number | null; EDT: number | null }
  warnings: AnalysisWarning[]
}

export interface BandResult extends DecayParameters {
  /** Nominal band centre (label), Hz. */
  centreHz: number
  /** Exact IEC 61260-1 mid-band frequency, Hz. */
  exactCentreHz: number
}

/** A decimated curve: x and y of equal length. */
export interface Curve {
  x: number[]
  y: number[]
}

export interface DecayCurve {
  /** Nominal band centre, Hz, or null for broadband. */
  centreHz: number | null
  /** Schroeder curve in dB re its start, against time in ms from the onset, decimated. */
  timeMs: number[]
  levelDb: number[]
  /** Fitted lines, as [startMs, startDb, endMs, endDb], for drawing the evaluation ranges. */
  fits: { EDT: number[] | null; T20: number[] | null; T30: number[] | null }
  /** Where the noise-floor truncation was placed, ms from the onset. */
  truncationMs: number | null
}

export interface WaterfallData {
  frequencyHz: number[]
  /** Start time of each slice, ms from the onset. */
  timeMs: number[]
  /** levelDb[sliceIndex][frequencyIndex], dB re the maximum of the first slice. */
  levelDb: number[][]
}

export interface DistortionBand {
  centreHz: number
  /** Level of the k-th harmonic relative to the fundamental response in this octave, dB. */
  harmonicsDb: { order: number; levelDb: number | null }[]
  /** Total harmonic distortion estimate, %. */
  thdPercent: number | null
}

export interface AnalysisSettings {
  bands: BandResolution
  smoothing: SmoothingFraction
  channel: number
  /** Optional time gate for the frequency response, ms after the onset. */
  gateMs: number | null
  timeReversedFiltering: boolean
}

export interface AnalysisResult {
  schemaVersion: number
  engineVersion: string
  settings: AnalysisSettings
  sampleRate: number
  kind: CaptureKind
  /** Onset (t = 0) per ISO 3382-1 Annex A, in samples of the analysed response and ms. */
  onsetSample: number
  onsetMs: number
  durationS: number
  bands: BandResult[]
  broadband: DecayParameters
  frequencyResponse: { frequencyHz: number[]; magnitudeDb: number[]; phaseDeg: number[] }
  energyTime: { timeMs: number[]; levelDb: number[] }
  decays: DecayCurve[]
  waterfall: WaterfallData | null
  distortion: DistortionBand[] | null
  warnings: AnalysisWarning[]
}
