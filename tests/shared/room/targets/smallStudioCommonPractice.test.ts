import { describe, expect, it } from 'vitest'
import { smallStudioCommonPracticeMask } from '../../../../shared/room/targets/smallStudioCommonPractice'

describe('smallStudioCommonPracticeMask', () => {
  it('returns 0.2–0.4 s from 200 Hz to 4 kHz and no limits outside', () => {
    // small home studios: ≈ 0.2–0.4 s flat over 200 Hz–4 kHz (common practice, no source; facts §9)
    const mask = smallStudioCommonPracticeMask([125, 200, 1000, 4000, 8000])
    expect(mask.bands.map((b) => [b.minS, b.maxS])).toEqual([[null, null], [0.2, 0.4], [0.2, 0.4], [0.2, 0.4], [null, null]])
    expect(mask.kind).toBe('common-practice')
    expect(mask.citation).toBeNull()
  })
})
