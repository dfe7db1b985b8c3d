// @vitest-environment jsdom
import { describe, expect, it } from 'vitest'
import { expectWithin } from '../helpers/tolerance'
import {
  cubicFeetToCubicMetres,
  cubicMetresToCubicFeet,
  feetToMetres,
  lengthFromMetres,
  lengthToMetres,
  metresToFeet,
  volumeFromCubicMetres,
  volumeToCubicMetres,
} from '@/utils/lengthUnits'

// Source: the international foot is defined as exactly 0.3048 m (international yard and pound
// agreement of 1959; NIST SP 811, appendix B). Hence 1 ft³ = 0.3048³ m³ = 0.028316846592 m³.
const EXACT = 1e-12

describe('lengthUnits', () => {
  it('returns 0.3048 m for one foot and 3.048 m for ten feet', () => {
    expectWithin(feetToMetres(1), 0.3048, EXACT)
    expectWithin(feetToMetres(10), 3.048, EXACT)
  })

  it('returns 1 ft for 0.3048 m and 10 ft for 3.048 m', () => {
    expectWithin(metresToFeet(0.3048), 1, EXACT)
    expectWithin(metresToFeet(3.048), 10, EXACT)
  })

  it('returns 12 ft for 3.6576 m (12 × 0.3048)', () => {
    expectWithin(metresToFeet(3.6576), 12, EXACT)
  })

  it('returns 0.028316846592 m³ for one cubic foot', () => {
    expectWithin(cubicFeetToCubicMetres(1), 0.028316846592, EXACT)
  })

  it('returns 1000 ft³ for 28.316846592 m³', () => {
    expectWithin(cubicMetresToCubicFeet(28.316846592), 1000, 1e-9)
  })

  it('returns the input after a round trip through feet, for lengths from 1 mm to 200 m', () => {
    for (const lengthM of [0.001, 0.3048, 2.6, 4.75, 12.345, 200]) {
      expectWithin(feetToMetres(metresToFeet(lengthM)), lengthM, EXACT * lengthM)
      expectWithin(cubicFeetToCubicMetres(cubicMetresToCubicFeet(lengthM)), lengthM, EXACT * lengthM)
    }
  })

  it('returns metres unchanged when the unit is m', () => {
    expect(lengthToMetres(4.2, 'm')).toBe(4.2)
    expect(lengthFromMetres(4.2, 'm')).toBe(4.2)
    expect(volumeToCubicMetres(85, 'm')).toBe(85)
    expect(volumeFromCubicMetres(85, 'm')).toBe(85)
  })

  it('returns the volume of a 10 × 12 × 8 ft room as 960 ft³ = 27.18417... m³', () => {
    const volumeM3 = feetToMetres(10) * feetToMetres(12) * feetToMetres(8)
    expectWithin(volumeM3, 960 * 0.028316846592, 1e-9)
    expectWithin(volumeFromCubicMetres(volumeM3, 'ft'), 960, 1e-9)
  })
})
