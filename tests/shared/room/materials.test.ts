import { describe, expect, it } from 'vitest'
import { absorptionAt, findMaterial, MATERIAL_BANDS_HZ, MATERIALS } from '../../../shared/room/materials'

describe('MATERIALS', () => {
  it('returns a source and eight band values on every row, with 63 Hz and 8 kHz left null', () => {
    for (const material of MATERIALS) {
      expect(material.source.length).toBeGreaterThan(10)
      expect(material.coefficients).toHaveLength(MATERIAL_BANDS_HZ.length)
      expect([material.coefficients[0], material.coefficients[7]]).toEqual([null, null])
    }
  })

  it('returns the Engineering Noise Control Table 6.2 values for carpet and gypsum board', () => {
    // Engineering Noise Control 5th ed. Table 6.2 (facts §8): carpet heavy on concrete
    // 0.02 0.06 0.14 0.37 0.60 0.65; gypsum board on studs 0.29 0.10 0.05 0.04 0.07 0.09
    expect(findMaterial('carpet-heavy-on-concrete').coefficients.slice(1, 7)).toEqual([0.02, 0.06, 0.14, 0.37, 0.6, 0.65])
    expect(findMaterial('gypsum-board-on-studs').coefficients.slice(1, 7)).toEqual([0.29, 0.1, 0.05, 0.04, 0.07, 0.09])
  })

  it('returns unique ids and coefficients between 0 and 1', () => {
    expect(new Set(MATERIALS.map((m) => m.id)).size).toBe(MATERIALS.length)
    for (const m of MATERIALS.filter((m) => m.kind === 'surface')) {
      expect(m.coefficients.every((a) => a === null || (a >= 0 && a <= 1))).toBe(true)
    }
  })
})

describe('absorptionAt', () => {
  it('returns the enclosing octave value for third-octave centres and null outside the table', () => {
    const wool = findMaterial('mineral-wool-24kg-50mm')
    // each octave value applied to its three thirds (common practice)
    expect([absorptionAt(wool, 100), absorptionAt(wool, 125), absorptionAt(wool, 160)]).toEqual([0.27, 0.27, 0.27])
    expect(absorptionAt(wool, 200)).toBe(0.54)
    expect([absorptionAt(wool, 63), absorptionAt(wool, 8000), absorptionAt(wool, 10000)]).toEqual([null, null, null])
  })

  it('throws for an unknown material id', () => {
    expect(() => findMaterial('no-such-material')).toThrow(RangeError)
  })
})
