import { describe, expect, it } from 'vitest'
import { bandVerdict, bandVerdicts } from '../../../../shared/room/targets/bandVerdict'
import { smallStudioCommonPracticeMask } from '../../../../shared/room/targets/smallStudioCommonPractice'

const BAND = { centreHz: 500, minS: 0.2, maxS: 0.4, nominalS: 0.3 }

describe('bandVerdict', () => {
  it('returns inside, too-live and too-dead against the limits', () => {
    // definition of the mask test: min ≤ T ≤ max inside (limits inclusive)
    expect(bandVerdict({ reverberationTimeS: 0.3, isReliable: true }, BAND)).toBe('inside')
    expect(bandVerdict({ reverberationTimeS: 0.4, isReliable: true }, BAND)).toBe('inside')
    expect(bandVerdict({ reverberationTimeS: 0.41, isReliable: true }, BAND)).toBe('too-live')
    expect(bandVerdict({ reverberationTimeS: 0.15, isReliable: true }, BAND)).toBe('too-dead')
  })

  it('returns not-reliable for a flagged or missing value, whatever the value', () => {
    expect(bandVerdict({ reverberationTimeS: 0.3, isReliable: false }, BAND)).toBe('not-reliable')
    expect(bandVerdict({ reverberationTimeS: null, isReliable: true }, BAND)).toBe('not-reliable')
  })

  it('returns not-analysed, never not-reliable, for a band no position was analysed in', () => {
    expect(bandVerdict({ reverberationTimeS: null, isReliable: false, isAnalysed: false }, BAND)).toBe('not-analysed')
  })

  it('returns no-target where the mask sets no limit', () => {
    expect(bandVerdict({ reverberationTimeS: 0.9, isReliable: true }, { centreHz: 63, minS: null, maxS: null, nominalS: null })).toBe('no-target')
  })
})

describe('bandVerdicts', () => {
  it('returns one verdict per mask band, not-analysed where nothing was measured', () => {
    const mask = smallStudioCommonPracticeMask([125, 250, 500, 1000])
    const verdicts = bandVerdicts(
      [
        { centreHz: 125, reverberationTimeS: 0.8, isReliable: true },
        { centreHz: 250, reverberationTimeS: 0.5, isReliable: true },
        { centreHz: 500, reverberationTimeS: 0.35, isReliable: true },
      ],
      mask,
    )
    expect(verdicts.map((v) => v.verdict)).toEqual(['no-target', 'too-live', 'inside', 'not-analysed'])
  })
})
