import { describe, expect, it } from 'vitest'
import { eyringReverberationTimeS, sabineConstant, sabineReverberationTimeS } from '../../../shared/room/reverberationFormulas'
import { expectWithin } from '../../helpers/tolerance'

// Master Handbook of Acoustics ch. 11, reverberation example 2 (facts §8): 23.3 × 16 × 10 ft,
// V = 3728 ft³, K = 0.049 s/ft; areas ft² and coefficients 125–4000 Hz
const FLOOR_FT2 = 373
const GYPSUM_FT2 = 1159
const TILE_FT2 = 340
const CONCRETE = [0.01, 0.01, 0.015, 0.02, 0.02, 0.02]
const GYPSUM = [0.29, 0.1, 0.05, 0.04, 0.07, 0.09]
const TILE = [0.09, 0.28, 0.78, 0.84, 0.73, 0.64]

describe('sabineConstant', () => {
  it('returns 0.16111 s/m at c = 343 m/s', () => {
    // K = 24·ln10/c (facts check values)
    expectWithin(sabineConstant(343), 0.16111, 1e-5)
  })

  it('returns the imperial 0.049 s/ft at c = 1130 ft/s', () => {
    // Master Handbook of Acoustics ch. 11 uses 0.049 (rounded); 24·ln10/1130 = 0.0489 (computed)
    expectWithin(sabineConstant(1130), 0.049, 0.0002)
  })
})

describe('sabineReverberationTimeS', () => {
  it('returns the Master Handbook example 2 times 0.49/0.85/0.56/0.54/0.54/0.55 s', () => {
    const printed = [0.49, 0.85, 0.56, 0.54, 0.54, 0.55]
    printed.forEach((expected, band) => {
      const sabins = FLOOR_FT2 * CONCRETE[band]! + GYPSUM_FT2 * GYPSUM[band]! + TILE_FT2 * TILE[band]!
      // Master Handbook of Acoustics ch. 11 example 2, ±0.005 s (printed to 0.01 s)
      expectWithin(sabineReverberationTimeS(3728, sabins, 0.049), expected, 0.005)
    })
  })

  it('returns the handbook total sabins from its printed inputs', () => {
    // Master Handbook example 2: totals 370.4 / 214.8 / 328.8 / 339.5 / 336.8 / 329.4 sabins
    const totals = [370.4, 214.8, 328.8, 339.5, 336.8, 329.4]
    totals.forEach((expected, band) => expectWithin(FLOOR_FT2 * CONCRETE[band]! + GYPSUM_FT2 * GYPSUM[band]! + TILE_FT2 * TILE[band]!, expected, 0.15))
  })

  it('returns 0.474 s for V = 50 m³, S = 85 m², ᾱ = 0.2', () => {
    // facts §8 (computed) with K = 24·ln10/343.2 (20 °C)
    expectWithin(sabineReverberationTimeS(50, 17, sabineConstant(343.2)), 0.474, 0.001)
  })
})

describe('eyringReverberationTimeS', () => {
  it('returns 0.4244 s for V = 50 m³, S = 85 m², ᾱ = 0.2', () => {
    // facts check value (computed there with c = 343.2 m/s, 20 °C), ±0.001 s
    expectWithin(eyringReverberationTimeS(50, 85, 0.2, sabineConstant(343.2))!, 0.4244, 0.001)
  })

  it('returns 0.137 s for ᾱ = 0.5 and tends to Sabine for small ᾱ', () => {
    // facts §8 (computed): ᾱ = 0.5 → Eyring 0.137 s; −ln(1 − ᾱ) → ᾱ as ᾱ → 0 (closed form)
    const k = sabineConstant(343.2)
    expectWithin(eyringReverberationTimeS(50, 85, 0.5, k)!, 0.137, 0.001)
    expectWithin(eyringReverberationTimeS(50, 85, 1e-6, k)! / sabineReverberationTimeS(50, 85e-6, k), 1, 1e-5)
  })

  it('returns null when ᾱ reaches 1', () => {
    expect(eyringReverberationTimeS(50, 85, 1, sabineConstant(343))).toBeNull()
  })
})
