import { describe, expect, it } from 'vitest'
import type { TreatmentDto } from '@shared/api'
import { predictReverberation, speedOfSoundMps } from '@shared/room'
import { builtInMaterials } from '@/composables/useWorkspaceMaterials'
import { TREATMENT_BOUNDARIES, treatmentBoundaryToRoomBoundary, treatmentToPrediction } from '@/roomModel/treatmentToPrediction'
import { expectWithin, expectWithinPercent } from '../../helpers/tolerance'

const room = { lengthM: 5, widthM: 4, heightM: 2.5 }
const bare: TreatmentDto = { surfaceMaterials: { floor: 'hard-surface', ceiling: 'hard-surface', walls: 'hard-surface' }, openings: [], absorbers: [] }
const materials = builtInMaterials()

describe('treatmentToPrediction', () => {
  it('returns the six boundaries summing to 2(LW + WH + HL) = 85 m² when the plan has no openings', () => {
    const input = treatmentToPrediction(room, bare, materials, { temperatureC: 20 })
    expect(input.volumeM3).toBe(50)
    expectWithin(input.surfaces.reduce((sum, s) => sum + s.areaM2, 0), 85, 1e-9)
  })

  it('returns the door taken off the rear wall and listed with its own material when an opening is given', () => {
    const plan: TreatmentDto = { ...bare, openings: [{ name: 'Door', boundary: 'rear wall', areaM2: 1.8, materialId: 'gypsum-board-on-studs' }] }
    const surfaces = treatmentToPrediction(room, plan, materials, {}).surfaces
    expectWithin(surfaces.find((s) => s.name === 'rear wall')!.areaM2, 10 - 1.8, 1e-9)
    expect(surfaces.find((s) => s.name === 'Door')).toMatchObject({ boundary: 'rear wall', areaM2: 1.8, materialId: 'gypsum-board-on-studs' })
  })

  it('returns absorbers mounted on the room maths’ side-wall names when the API says “left wall”', () => {
    const plan: TreatmentDto = { ...bare, absorbers: [{ name: 'Panel', materialId: 'mineral-wool-24kg-50mm', areaM2: 0.72, count: 4, mountedOn: 'left wall' }, { name: 'Sofa', materialId: 'person-seated', areaM2: 1, count: 2 }] }
    const { absorbers } = treatmentToPrediction(room, plan, materials, {})
    expect(absorbers![0]).toMatchObject({ mountedOn: 'left side wall', count: 4 })
    expect(absorbers![1]).not.toHaveProperty('mountedOn')
    expect(TREATMENT_BOUNDARIES.map(treatmentBoundaryToRoomBoundary)).toEqual(['front wall', 'rear wall', 'left side wall', 'right side wall', 'floor', 'ceiling'])
  })

  it('returns Sabine T = 24·ln10·V/(c·A) when every surface is hard and air absorption is off', () => {
    // Sabine (closed form; facts §8): hard surface α(500 Hz) = 0.03 (Engineering Noise Control Table 6.2),
    // A = 85 × 0.03 = 2.55 m², c(20 °C) = 343.2 m/s → T = 0.161019 × 50 / 2.55 = 3.157 s.
    const input = { ...treatmentToPrediction(room, bare, materials, { temperatureC: 20 }), includeAirAbsorption: false }
    const band = predictReverberation(input).bands.find((b) => b.centreHz === 500)!
    expectWithinPercent(band.sabineS!, ((24 * Math.LN10) / speedOfSoundMps(20)) * 50 / 2.55, 1e-9)
    expectWithinPercent(band.sabineS!, 3.157, 0.05)
  })

  it('throws a RangeError when an opening is larger than its wall', () => {
    const plan: TreatmentDto = { ...bare, openings: [{ name: 'Glass wall', boundary: 'front wall', areaM2: 11, materialId: 'glass-window' }] }
    expect(() => treatmentToPrediction(room, plan, materials, {})).toThrow(RangeError)
  })
})
