import type { PredictedBand } from '@shared/room'
import { measuredInDateOrder, type MeasuredSurvey } from './measuredSurvey'

/** Mid-band: the 500 Hz and 1 kHz octaves, or their thirds 400 Hz–1.25 kHz (as src/readings/midBandMean). */
export const MID_BAND_RANGE_HZ: [number, number] = [355, 1413]
/** The bands whose T damps the modal model: the 63–250 Hz octaves (thirds 50–280 Hz). */
export const LOW_BAND_RANGE_HZ: [number, number] = [44, 355]

/** Arithmetic mean of the non-null values whose band centre lies in [lowHz, highHz); null if none. */
export function meanInRange(bands: readonly { centreHz: number; valueS: number | null }[], [lowHz, highHz]: [number, number]): number | null {
  const values = bands.filter((b) => b.centreHz >= lowHz && b.centreHz < highHz && b.valueS !== null && Number.isFinite(b.valueS)).map((b) => b.valueS as number)
  return values.length === 0 ? null : values.reduce((sum, v) => sum + v, 0) / values.length
}

export interface ReverberationBasis {
  reverberationTimeS: number
  basis: 'measured' | 'predicted'
  /** The survey measured, when basis is 'measured'. */
  surveyName: string | null
}

/**
 * The T a figure is computed from: the latest measured survey's mean over the range when it has
 * one, else the predicted Sabine mean over the same range; null when neither exists.
 */
export function pickReverberationBasis(surveys: readonly MeasuredSurvey[], predicted: readonly PredictedBand[], range: [number, number]): ReverberationBasis | null {
  const ordered = measuredInDateOrder(surveys)
  for (let i = ordered.length - 1; i >= 0; i--) {
    const survey = ordered[i]!
    const measuredS = meanInRange(survey.readings.map((r) => ({ centreHz: r.centreHz, valueS: r.reverberationTimeS })), range)
    if (measuredS !== null) return { reverberationTimeS: measuredS, basis: 'measured', surveyName: survey.name }
  }
  const predictedS = meanInRange(predicted.map((b) => ({ centreHz: b.centreHz, valueS: b.sabineS })), range)
  // The library starts at 125 Hz: for the low range fall back to the lowest predicted band.
  const lowestS = predicted.find((b) => b.sabineS !== null)?.sabineS ?? null
  const valueS = predictedS ?? (range[1] <= MID_BAND_RANGE_HZ[0] ? lowestS : null)
  return valueS === null ? null : { reverberationTimeS: valueS, basis: 'predicted', surveyName: null }
}
