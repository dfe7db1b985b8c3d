import { describe, expect, it } from 'vitest'
import { airAttenuationDbPerM, airEnergyAbsorptionPerM } from '../../../shared/room/airAbsorption'
import { expectWithinPercent } from '../../helpers/tolerance'

// ISO 9613-1:1993 pure-tone values at 20 °C, 50 % RH, 101.325 kPa, as tabulated in the facts §8
// (computed there with the standard's formulas): [f Hz, α dB/km, m 1e-3 1/m]
const FACTS_TABLE: [number, number, number][] = [
  [125, 0.44, 0.1],
  [250, 1.31, 0.3],
  [500, 2.73, 0.63],
  [1000, 4.67, 1.07],
  [2000, 9.89, 2.28],
  [4000, 29.7, 6.83],
  [8000, 105, 24.2],
]

describe('airEnergyAbsorptionPerM', () => {
  it('returns 6.83e-3 1/m at 4 kHz, 20 °C, 50 % RH', () => {
    // facts check-value table: ISO 9613-1 (computed), ±2 %
    expectWithinPercent(airEnergyAbsorptionPerM(4000), 6.83e-3, 2)
  })

  it('matches every column of the facts table within rounding', () => {
    for (const [frequencyHz, , mMilli] of FACTS_TABLE) {
      // facts §8 table, ISO 9613-1; ±2 % plus half a unit of the table's last printed digit
      const tolerance = Math.max(2, (0.005 / mMilli) * 100)
      expectWithinPercent(airEnergyAbsorptionPerM(frequencyHz) * 1000, mMilli, tolerance)
    }
  })

  it('equals α/4.343', () => {
    // m = α/(10·lg e) (facts §8)
    expectWithinPercent(airEnergyAbsorptionPerM(2000), airAttenuationDbPerM(2000) / 4.343, 0.01)
  })
})

describe('airAttenuationDbPerM', () => {
  it('matches the facts table in dB/km within 1 %', () => {
    // facts §8 table, ISO 9613-1:1993 (computed)
    for (const [frequencyHz, alphaDbPerKm] of FACTS_TABLE) {
      expectWithinPercent(airAttenuationDbPerM(frequencyHz) * 1000, alphaDbPerKm, alphaDbPerKm < 1 ? 1.5 : 1)
    }
  })

  it('returns more absorption in dry air at 4 kHz than at 50 % RH', () => {
    // ISO 9613-1 Table 1 trend: at 20 °C, 4 kHz absorption peaks at low humidity (~10–20 % RH)
    expect(airAttenuationDbPerM(4000, { relativeHumidityPercent: 20 })).toBeGreaterThan(airAttenuationDbPerM(4000))
  })
})
