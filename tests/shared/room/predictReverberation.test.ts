import { describe, expect, it } from 'vitest'
import { MATERIALS, type AbsorptionMaterial } from '../../../shared/room/materials'
import { predictReverberation } from '../../../shared/room/predictReverberation'
import { roomSurfaces, type SurfaceArea } from '../../../shared/room/roomSurfaces'
import { expectWithin } from '../../helpers/tolerance'

const FT2_TO_M2 = 0.09290304
const FT3_TO_M3 = 0.028316846592

// Master Handbook of Acoustics ch. 11, example 2 inputs (facts §8); the handbook's own materials
const HANDBOOK_MATERIALS: AbsorptionMaterial[] = [
  ...MATERIALS,
  { id: 'concrete', name: 'Concrete floor', kind: 'surface', coefficients: [null, 0.01, 0.01, 0.015, 0.02, 0.02, 0.02, null], source: 'Master Handbook of Acoustics ch. 11 example 2' },
  { id: 'tile', name: 'Acoustical tile', kind: 'surface', coefficients: [null, 0.09, 0.28, 0.78, 0.84, 0.73, 0.64, null], source: 'Master Handbook of Acoustics ch. 11 example 2' },
]
const HANDBOOK_SURFACES: SurfaceArea[] = [
  { name: 'floor', boundary: 'floor', areaM2: 373 * FT2_TO_M2, materialId: 'concrete' },
  { name: 'walls', boundary: 'front wall', areaM2: 1159 * FT2_TO_M2, materialId: 'gypsum-board-on-studs' },
  { name: 'ceiling', boundary: 'ceiling', areaM2: 340 * FT2_TO_M2, materialId: 'tile' },
]

describe('predictReverberation', () => {
  it('returns the Master Handbook example 2 in metric units without air absorption', () => {
    const result = predictReverberation({ volumeM3: 3728 * FT3_TO_M3, surfaces: HANDBOOK_SURFACES, materials: HANDBOOK_MATERIALS, includeAirAbsorption: false })
    // Master Handbook of Acoustics ch. 11 example 2: 182.7 / total sabins (370.4 … 329.4), i.e.
    // before rounding to the printed 0.49/0.85/0.56/0.54/0.54/0.55 s; facts §8: metric reproduces it within 0.002 s
    const handbook = [370.4, 214.8, 328.8, 339.5, 336.8, 329.4].map((sabins) => 182.7 / sabins)
    result.bands.forEach((band, i) => expectWithin(band.sabineS!, handbook[i]!, 0.002))
  })

  it('returns shorter times at 4 kHz once air absorption 4mV is included', () => {
    // 4mV with m(4 kHz, 20 °C, 50 %) = 6.83e-3 1/m (ISO 9613-1, facts §8): 4·6.83e-3·105.6 = 2.88 m²
    const withAir = predictReverberation({ volumeM3: 3728 * FT3_TO_M3, surfaces: HANDBOOK_SURFACES, materials: HANDBOOK_MATERIALS })
    const band4k = withAir.bands.at(-1)!
    expectWithin(band4k.airAbsorptionM2, 4 * 6.83e-3 * 3728 * FT3_TO_M3, 0.03)
    expect(band4k.sabineS!).toBeLessThan(182.7 / 329.4)
  })

  it('returns Sabine 0.474 s and Eyring 0.424 s for the 5 × 4 × 2.5 m room at ᾱ = 0.2', () => {
    // facts §8 (computed): V = 50, S = 85, ᾱ = 0.2 → Sabine 0.474 s, Eyring 0.424 s
    const uniform: AbsorptionMaterial = { id: 'uniform', name: 'Uniform', kind: 'surface', coefficients: Array(8).fill(0.2), source: 'test input' }
    const surfaces = roomSurfaces({ lengthM: 5, widthM: 4, heightM: 2.5 }, { floor: 'uniform', ceiling: 'uniform', walls: 'uniform' })
    const [band] = predictReverberation({ volumeM3: 50, surfaces, materials: [uniform], bandsHz: [500], includeAirAbsorption: false }).bands
    expectWithin(band!.meanAbsorption!, 0.2, 1e-12)
    expectWithin(band!.sabineS!, 0.474, 0.001)
    expectWithin(band!.eyringS!, 0.4244, 0.001)
  })

  it('returns the added area of mounted panels less the wall they cover', () => {
    const room = { lengthM: 5, widthM: 4, heightM: 2.5 }
    const surfaces = roomSurfaces(room, { floor: 'hard-surface', ceiling: 'hard-surface', walls: 'hard-surface' })
    const bare = predictReverberation({ volumeM3: 50, surfaces, bandsHz: [1000] }).bands[0]!
    const treated = predictReverberation({
      volumeM3: 50,
      surfaces,
      bandsHz: [1000],
      absorbers: [{ name: 'panels', materialId: 'mineral-wool-24kg-50mm', areaM2: 0.72, count: 6, mountedOn: 'left side wall' }],
    }).bands[0]!
    // A = Σ S·α: 6 × 0.72 m² of α 1.0 replace α 0.03 (ENC Table 6.2): ΔA = 4.32·(1.0 − 0.03) m² (closed form)
    expectWithin(treated.absorptionAreaM2! - bare.absorptionAreaM2!, 4.32 * 0.97, 1e-9)
    expect(treated.sabineS!).toBeLessThan(bare.sabineS!)
  })

  it('returns null times where a material has no value and names it', () => {
    const surfaces = roomSurfaces({ lengthM: 5, widthM: 4, heightM: 2.5 }, { floor: 'hard-surface', ceiling: 'hard-surface', walls: 'hard-surface' })
    const [band63] = predictReverberation({ volumeM3: 50, surfaces, bandsHz: [63] }).bands
    expect(band63!.sabineS).toBeNull()
    expect(band63!.missingMaterials).toEqual(['hard-surface'])
  })

  it('returns seated people as absorption area per person', () => {
    // ENC Table 6.2: 0.44 m² per seated person at 500 Hz → 10 people add 4.4 m²
    const surfaces = roomSurfaces({ lengthM: 5, widthM: 4, heightM: 2.5 }, { floor: 'hard-surface', ceiling: 'hard-surface', walls: 'hard-surface' })
    const empty = predictReverberation({ volumeM3: 50, surfaces, bandsHz: [500] }).bands[0]!
    const full = predictReverberation({ volumeM3: 50, surfaces, bandsHz: [500], absorbers: [{ name: 'class', materialId: 'person-seated', areaM2: 0, count: 10 }] }).bands[0]!
    expectWithin(full.absorptionAreaM2! - empty.absorptionAreaM2!, 4.4, 1e-9)
  })

  it('throws when panels cover more than their wall', () => {
    const surfaces = roomSurfaces({ lengthM: 5, widthM: 4, heightM: 2.5 }, { floor: 'hard-surface', ceiling: 'hard-surface', walls: 'hard-surface' })
    const absorbers = [{ name: 'panels', materialId: 'mineral-wool-24kg-50mm', areaM2: 5, count: 3, mountedOn: 'front wall' }]
    expect(() => predictReverberation({ volumeM3: 50, surfaces, absorbers })).toThrow(RangeError)
  })
})
