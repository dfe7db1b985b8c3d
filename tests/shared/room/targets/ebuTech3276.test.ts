import { describe, expect, it } from 'vitest'
import { ebuMeanReverberationTimeS, ebuTech3276Mask } from '../../../../shared/room/targets/ebuTech3276'
import { expectWithin } from '../../../helpers/tolerance'

describe('ebuMeanReverberationTimeS', () => {
  it('returns 0.2321 s for V = 80 m³', () => {
    // EBU Tech 3276: Tm = 0.25·(V/100)^(1/3) (facts check values, ±1e-4)
    expectWithin(ebuMeanReverberationTimeS(80), 0.2321, 1e-4)
  })

  it('returns the facts table values for 30, 50, 100 and 200 m³', () => {
    // facts §9 (computed): 0.167, 0.198, 0.250, 0.315 s
    const expected: [number, number][] = [[30, 0.167], [50, 0.198], [100, 0.25], [200, 0.315]]
    for (const [volumeM3, tS] of expected) expectWithin(ebuMeanReverberationTimeS(volumeM3), tS, 0.0005)
  })
})

describe('ebuTech3276Mask', () => {
  const tm = 0.25
  const mask = ebuTech3276Mask(100, [63, 100, 200, 1000, 4000, 8000])
  const band = (hz: number) => mask.bands.find((b) => b.centreHz === hz)!

  it('returns Tm ± 0.05 s across 200 Hz–4 kHz', () => {
    // EBU Tech 3276 / BS.1116 tolerance (facts §9; mask from memory — verify)
    for (const hz of [200, 1000, 4000]) {
      expectWithin(band(hz).maxS!, tm + 0.05, 1e-12)
      expectWithin(band(hz).minS!, tm - 0.05, 1e-12)
    }
  })

  it('returns the low-frequency upper limit Tm + 0.3 s at 63 Hz and ≈ Tm + 0.2 s at 100 Hz', () => {
    // facts §9 (from memory — verify): linear in lg f from +0.05 at 200 Hz to +0.3 at 63 Hz
    expectWithin(band(63).maxS!, tm + 0.3, 1e-12)
    expectWithin(band(100).maxS!, tm + 0.2, 0.005)
  })

  it('returns the lower limit Tm − 0.1 s and upper Tm + 0.05 s at 8 kHz', () => {
    // facts §9 (from memory — verify)
    expectWithin(band(8000).minS!, tm - 0.1, 1e-12)
    expectWithin(band(8000).maxS!, tm + 0.05, 1e-12)
  })

  it('returns its standard, edition and clause, and notes without internal provenance', () => {
    expect(mask.kind).toBe('published')
    expect(mask.citation).toMatchObject({ standard: expect.stringContaining('EBU Tech 3276'), edition: 'ITU-R BS.1116-3' })
    expect(mask.citation!.clause).toContain('Fig. 3')
    expect(JSON.stringify(mask)).not.toMatch(/from memory|verify|facts|§/i)
    expect(mask.bands.every((b) => b.nominalS === ebuMeanReverberationTimeS(100))).toBe(true)
  })
})
