import { describe, expect, it } from 'vitest'
import { builtInMaterials } from '@/composables/useWorkspaceMaterials'
import { reflectionAbsorption } from '@/roomModel/reflectionAbsorption'

describe('reflectionAbsorption', () => {
  it('returns the mean 500 Hz–2 kHz coefficient of each boundary’s material, a wall’s own material first', () => {
    // Engineering Noise Control Table 6.2 rows: plaster on brick 0.02/0.03/0.04, carpet 0.14/0.37/0.60, 24 kg/m³ wool 0.94/1.0/1.0.
    const absorption = reflectionAbsorption(
      { surfaceMaterials: { floor: 'carpet-heavy-on-concrete', ceiling: 'plaster-on-brick', walls: 'plaster-on-brick', leftWall: 'mineral-wool-24kg-50mm' }, openings: [], absorbers: [] },
      builtInMaterials(),
    )
    expect(absorption.floor).toBeCloseTo((0.14 + 0.37 + 0.6) / 3, 12)
    expect(absorption['right side wall']).toBeCloseTo(0.03, 12)
    expect(absorption['left side wall']).toBeCloseTo((0.94 + 1 + 1) / 3, 12)
  })

  it('leaves a boundary out when its material is unknown', () => {
    expect(reflectionAbsorption({ surfaceMaterials: { floor: 'custom-9', ceiling: 'custom-9', walls: 'custom-9' }, openings: [], absorbers: [] }, builtInMaterials())).toEqual({})
  })
})
