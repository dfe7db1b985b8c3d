import { describe, expect, it } from 'vitest'
import type { PredictedBand } from '@shared/room'
import type { MeasuredSurvey } from '@/roomModel/measuredSurvey'
import { LOW_BAND_RANGE_HZ, meanInRange, MID_BAND_RANGE_HZ, pickReverberationBasis } from '@/roomModel/reverberationBasis'

const reading = (centreHz: number, reverberationTimeS: number | null) => ({ centreHz, reverberationTimeS, parameter: 'T30' as const, isReliable: true, isAnalysed: true, positionCount: 2, uncertaintyS: null, reliabilityNote: null })
const survey = (surveyId: number, name: string, measuredOn: string, values: [number, number | null][]): MeasuredSurvey => ({ surveyId, name, measuredOn, temperatureC: 20, humidityPercent: 50, readings: values.map(([f, t]) => reading(f, t)) })
const predicted = (centreHz: number, sabineS: number | null): PredictedBand => ({ centreHz, sabineS, eyringS: null, absorptionAreaM2: null, airAbsorptionM2: 0, meanAbsorption: null, missingMaterials: [] })

describe('meanInRange', () => {
  it('returns the mean of the 500 Hz and 1 kHz values when mid-band is asked (ISO 3382-1 single number, from memory)', () => {
    const bands = [{ centreHz: 250, valueS: 0.9 }, { centreHz: 500, valueS: 0.5 }, { centreHz: 1000, valueS: 0.3 }, { centreHz: 2000, valueS: 0.1 }]
    expect(meanInRange(bands, MID_BAND_RANGE_HZ)).toBeCloseTo(0.4, 12)
    expect(meanInRange([{ centreHz: 500, valueS: null }], MID_BAND_RANGE_HZ)).toBeNull()
  })
})

describe('pickReverberationBasis', () => {
  const prediction = [predicted(125, 0.8), predicted(250, 0.6), predicted(500, 0.5), predicted(1000, 0.4)]

  it('returns the latest measured survey when surveys have values', () => {
    const surveys = [survey(2, 'Panels', '2026-03-20', [[500, 0.3], [1000, 0.2]]), survey(1, 'Bare', '2026-03-01', [[500, 0.7], [1000, 0.6]])]
    expect(pickReverberationBasis(surveys, prediction, MID_BAND_RANGE_HZ)).toEqual({ reverberationTimeS: 0.25, basis: 'measured', surveyName: 'Panels' })
  })

  it('returns the predicted Sabine mean when no survey has a value in the range', () => {
    const surveys = [survey(1, 'Bare', '2026-03-01', [[500, null], [4000, 0.3]])]
    expect(pickReverberationBasis(surveys, prediction, MID_BAND_RANGE_HZ)).toEqual({ reverberationTimeS: 0.45, basis: 'predicted', surveyName: null })
    expect(pickReverberationBasis([], prediction, LOW_BAND_RANGE_HZ)!.reverberationTimeS).toBeCloseTo(0.7, 12)
  })

  it('returns null when there is neither a measurement nor a prediction', () => {
    expect(pickReverberationBasis([], [predicted(500, null)], MID_BAND_RANGE_HZ)).toBeNull()
  })
})
