import { describe, expect, it } from 'vitest'
import { parseCompareQuery, toCompareQuery, toggleComparedSurvey } from '@/forms/compareQuery'

describe('parseCompareQuery', () => {
  it('returns the surveys in the order given, the bands and the smoothing when the query is valid', () => {
    expect(parseCompareQuery({ surveys: '3,1,5', bands: 'third', smoothing: '3' })).toEqual({ surveyIds: [3, 1, 5], bands: 'third', smoothing: 3 })
  })

  it('returns octave bands, 1/6 smoothing and no surveys when the query is empty', () => {
    expect(parseCompareQuery({})).toEqual({ surveyIds: [], bands: 'octave', smoothing: 6 })
  })

  it('drops junk ids, repeats, zero and anything past six surveys', () => {
    const state = parseCompareQuery({ surveys: '4,x,4,0,-2,7,8,9,10,11,12,13', bands: 'weird', smoothing: '7' })

    expect(state.surveyIds).toEqual([4, 7, 8, 9, 10, 11])
    expect(state.bands).toBe('octave')
    expect(state.smoothing).toBe(6)
  })

  it('reads the first value when a parameter is repeated', () => {
    expect(parseCompareQuery({ surveys: ['2,3', '9'], smoothing: ['1', '3'] })).toMatchObject({ surveyIds: [2, 3], smoothing: 1 })
  })

  it('falls back to 1/6 when the link asks for finer smoothing than the survey averages have', () => {
    expect(parseCompareQuery({ surveys: '1,2', smoothing: '24' }).smoothing).toBe(6)
  })
})

describe('toCompareQuery', () => {
  it('returns a query that parses back to the same state', () => {
    const state = { surveyIds: [5, 2], bands: 'third' as const, smoothing: 1 as const }

    expect(parseCompareQuery(toCompareQuery(state))).toEqual(state)
    expect(toCompareQuery(state)).toEqual({ surveys: '5,2', bands: 'third', smoothing: '1' })
  })
})

describe('toggleComparedSurvey', () => {
  it('returns the picked surveys in date order when one is added', () => {
    expect(toggleComparedSurvey([9], 4, [4, 9, 12])).toEqual([4, 9])
  })

  it('returns the list without the survey when it was picked', () => {
    expect(toggleComparedSurvey([4, 9, 12], 9, [4, 9, 12])).toEqual([4, 12])
  })

  it('keeps ids from an old link that are not among the room’s surveys at the end', () => {
    expect(toggleComparedSurvey([77], 4, [4, 9])).toEqual([4, 77])
  })
})
