import { describe, expect, it } from 'vitest'
import { ansiS1260Mask, ansiS1260MaxS } from '../../../../shared/room/targets/ansiS1260'

describe('ansiS1260MaxS', () => {
  it('returns 0.6 s at 250 m³ and 0.7 s at 400 m³', () => {
    // ANSI/ASA S12.60-2010 Part 1 (facts check values, exact): < 283 m³ → 0.6 s, 283–566 m³ → 0.7 s
    expect(ansiS1260MaxS(250)).toBe(0.6)
    expect(ansiS1260MaxS(400)).toBe(0.7)
  })

  it('returns null above 566 m³ where no limit is given', () => {
    // ANSI S12.60 (facts §9): no limit given above 20 000 ft³
    expect(ansiS1260MaxS(600)).toBeNull()
  })
})

describe('ansiS1260Mask', () => {
  it('returns an upper limit only in the 500–2000 Hz octaves', () => {
    // evaluated at 500, 1000, 2000 Hz (facts §9, from memory — verify)
    const mask = ansiS1260Mask(250, [250, 500, 1000, 2000, 4000])
    expect(mask.bands.map((b) => b.maxS)).toEqual([null, 0.6, 0.6, 0.6, null])
    expect(mask.bands.every((b) => b.minS === null)).toBe(true)
  })
})
