import { describe, expect, it } from 'vitest'
import { din18041Mask, din18041NominalS } from '../../../../shared/room/targets/din18041'
import { expectWithin } from '../../../helpers/tolerance'

describe('din18041NominalS', () => {
  it('returns 0.5663 s for A3 and 0.4583 s for A4 at V = 200 m³', () => {
    // DIN 18041 A3 = 0.32·lgV − 0.17, A4 = 0.26·lgV − 0.14 (facts check values, ±1e-4)
    expectWithin(din18041NominalS('A3', 200).nominalS, 0.5663, 1e-4)
    expectWithin(din18041NominalS('A4', 200).nominalS, 0.4583, 1e-4)
  })

  it('returns the A1, A2 and A5 formulas and flags volumes outside a range', () => {
    // DIN 18041 group A formulas (facts §9): A1 0.45·lgV + 0.07, A2 0.37·lgV − 0.14, A5 0.75·lgV − 1.00
    expectWithin(din18041NominalS('A1', 100).nominalS, 0.97, 1e-12)
    expectWithin(din18041NominalS('A2', 1000).nominalS, 0.97, 1e-12)
    expectWithin(din18041NominalS('A5', 1000).nominalS, 1.25, 1e-12)
    expect(din18041NominalS('A5', 20_000)).toEqual({ nominalS: 2.0, isVolumeInRange: true })
    expect(din18041NominalS('A4', 600).isVolumeInRange).toBe(false)
    expect(din18041NominalS('A3', 30).isVolumeInRange).toBe(true)
  })
})

describe('din18041Mask', () => {
  it('returns the tolerance multiples at 63, 125, 250–2000, 4000 and 8000 Hz', () => {
    // DIN 18041 tolerance band (facts §9, secondary source — verify): upper 1.7/1.45/1.2,
    // lower 0.5/0.65/0.8/0.65/0.5
    const mask = din18041Mask('A3', 200, [63, 125, 250, 1000, 2000, 4000, 8000])
    const nominal = din18041NominalS('A3', 200).nominalS
    const ratios = mask.bands.map((b) => [b.minS! / nominal, b.maxS! / nominal].map((r) => Math.round(r * 1000) / 1000))
    expect(ratios).toEqual([[0.5, 1.7], [0.65, 1.45], [0.8, 1.2], [0.8, 1.2], [0.8, 1.2], [0.65, 1.2], [0.5, 1.2]])
  })

  it('returns values interpolated in lg f between the tabulated bands', () => {
    // halfway in lg f between 125 and 250 Hz: upper (1.45 + 1.2)/2, lower (0.65 + 0.8)/2 (closed form)
    const nominal = din18041NominalS('A3', 200).nominalS
    const [band] = din18041Mask('A3', 200, [Math.sqrt(125 * 250)]).bands
    expectWithin(band!.maxS! / nominal, 1.325, 1e-12)
    expectWithin(band!.minS! / nominal, 0.725, 1e-12)
  })

  it('returns a note when the volume lies outside the group range', () => {
    expect(din18041Mask('A4', 800, [500]).notes.join(' ')).toContain('extrapolated')
  })
})
