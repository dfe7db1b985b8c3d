import { describe, expect, it } from 'vitest'
import { measuredSurveySeries, predictedReverberationSeries, surveyRole } from '@/roomModel/reverberationSeries'

const reading = (centreHz: number, reverberationTimeS: number | null) => ({ centreHz, reverberationTimeS, parameter: 'T30' as const, isReliable: true, isAnalysed: true, positionCount: 2, uncertaintyS: null, reliabilityNote: null })

describe('surveyRole', () => {
  it('returns single for one survey, and before … after for several in date order', () => {
    expect(surveyRole(0, 1)).toBe('single')
    expect([0, 1, 2].map((i) => surveyRole(i, 3))).toEqual(['before', 'other', 'after'])
  })
})

describe('measuredSurveySeries', () => {
  it('returns the surveys oldest first, leaving out those without any value', () => {
    const series = measuredSurveySeries([
      { surveyId: 3, name: 'Traps', measuredOn: '2026-04-02', temperatureC: null, humidityPercent: null, readings: [reading(500, 0.3)] },
      { surveyId: 1, name: 'Bare', measuredOn: '2026-03-01', temperatureC: null, humidityPercent: null, readings: [reading(500, 0.6)] },
      { surveyId: 2, name: 'Empty', measuredOn: '2026-03-10', temperatureC: null, humidityPercent: null, readings: [reading(500, null)] },
    ])
    expect(series.map((s) => [s.name, s.role])).toEqual([['Bare (2026-03-01)', 'before'], ['Traps (2026-04-02)', 'after']])
  })
})

describe('predictedReverberationSeries', () => {
  it('returns a Sabine and an Eyring series with the band values', () => {
    const [sabine, eyring] = predictedReverberationSeries([{ centreHz: 500, sabineS: 0.5, eyringS: 0.45, absorptionAreaM2: 10, airAbsorptionM2: 0, meanAbsorption: 0.1, missingMaterials: [] }])
    expect(sabine!.bands).toEqual([{ centreHz: 500, reverberationTimeS: 0.5 }])
    expect(eyring!.bands).toEqual([{ centreHz: 500, reverberationTimeS: 0.45 }])
  })
})
