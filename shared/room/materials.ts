/** Octave bands of the material library, Hz. 63 and 8000 Hz are null: the table stops at 125–4000 Hz. */
export const MATERIAL_BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const

export interface AbsorptionMaterial {
  id: string
  name: string
  /**
   * 'surface': dimensionless absorption coefficients α per band, applied to an area;
   * 'object': equivalent absorption area per item, m² (e.g. one seated person).
   */
  kind: 'surface' | 'object'
  /** One value per MATERIAL_BANDS_HZ entry; null where the source gives none. */
  coefficients: readonly (number | null)[]
  source: string
  caution?: string
}

// Both tables as transcribed in the project's acoustics facts §8.
const ENC = 'Engineering Noise Control, 5th ed. (2017), Table 6.2'
const FIRE = 'Check the fire rating of fibrous and fabric products; follow local building and fire codes.'

/** Builds a row from the six published octaves 125–4000 Hz; 63 and 8000 Hz stay null (not extrapolated). */
function row(id: string, name: string, published: [number, number, number, number, number, number], extra: Partial<AbsorptionMaterial> = {}): AbsorptionMaterial {
  return { id, name, kind: 'surface', coefficients: [null, ...published, null], source: ENC, ...extra }
}

/**
 * Built-in materials, generic names only. Sabine coefficients, octave bands 125 Hz–4 kHz;
 * values above 1 are capped at 1.0 in the source table.
 */
export const MATERIALS: readonly AbsorptionMaterial[] = [
  row('hard-surface', 'Hard surface (brick, plaster, hard floor)', [0.02, 0.02, 0.03, 0.03, 0.04, 0.05]),
  row('plaster-on-brick', 'Plaster, gypsum or lime, smooth on brick', [0.013, 0.015, 0.02, 0.03, 0.04, 0.05]),
  row('gypsum-board-on-studs', 'Gypsum board on 50 × 100 mm studs', [0.29, 0.1, 0.05, 0.04, 0.07, 0.09]),
  row('glass-heavy-plate', 'Glass, heavy plate', [0.18, 0.06, 0.04, 0.03, 0.02, 0.02]),
  row('glass-window', 'Glass, ordinary window', [0.35, 0.25, 0.18, 0.12, 0.07, 0.04]),
  row('carpet-heavy-on-concrete', 'Carpet, heavy, on concrete', [0.02, 0.06, 0.14, 0.37, 0.6, 0.65]),
  row('wood-floor-on-joists', 'Wood floor on joists', [0.15, 0.11, 0.1, 0.07, 0.06, 0.07]),
  row('mineral-wool-24kg-50mm', 'Mineral or glass wool, 24 kg/m³, 50 mm', [0.27, 0.54, 0.94, 1.0, 1.0, 1.0], { caution: FIRE }),
  row('mineral-wool-16kg-50mm', 'Mineral or glass wool, 16 kg/m³, 50 mm', [0.17, 0.45, 0.8, 0.89, 0.97, 0.94], { caution: FIRE }),
  row('mineral-wool-16kg-100mm', 'Mineral or glass wool, 16 kg/m³, 100 mm', [0.43, 0.86, 1.0, 1.0, 1.0, 1.0], { caution: FIRE }),
  row('mineral-wool-48kg-100mm', 'Mineral or glass wool, 48 kg/m³, 100 mm', [0.65, 1.0, 1.0, 1.0, 1.0, 1.0], { caution: FIRE }),
  row('heavy-velour-draped', 'Heavy velour 610 g/m², draped to half area', [0.14, 0.35, 0.55, 0.72, 0.7, 0.65], { caution: FIRE }),
  row('audience-upholstered', 'Audience, 100 % occupied, upholstered seats', [0.52, 0.68, 0.85, 0.97, 0.93, 0.85]),
  row('person-seated', 'Seated person (absorption area per person, m²)', [0.23, 0.37, 0.44, 0.45, 0.45, 0.45], { kind: 'object' }),
  row('glass-fibre-mat-80kg-50mm', 'Glass-fibre mat, 80 kg/m³, 50 mm', [0.2, 0.45, 0.7, 0.8, 0.8, 0.8], {
    source: '"Audio Engineering" handbook, Table 29.3',
    caution: FIRE,
  }),
]

/**
 * Absorption value of a material for a band centre: the octave value for an octave centre, and the
 * value of the enclosing octave for a third-octave centre (each octave's value applied to its
 * three thirds — common practice). Null where the source has no value.
 */
export function absorptionAt(material: AbsorptionMaterial, centreHz: number): number | null {
  let nearest = 0
  MATERIAL_BANDS_HZ.forEach((bandHz, i) => {
    if (Math.abs(Math.log2(centreHz / bandHz)) < Math.abs(Math.log2(centreHz / MATERIAL_BANDS_HZ[nearest]!))) nearest = i
  })
  // Outside the library's octaves (below 44 Hz or above 11.3 kHz) there is no value.
  if (Math.abs(Math.log2(centreHz / MATERIAL_BANDS_HZ[nearest]!)) > 0.5 + 1e-6) return null
  return material.coefficients[nearest] ?? null
}

/** Looks a material up by id in a library (the built-in one by default). */
export function findMaterial(id: string, library: readonly AbsorptionMaterial[] = MATERIALS): AbsorptionMaterial {
  const material = library.find((m) => m.id === id)
  if (!material) throw new RangeError(`unknown material '${id}'`)
  return material
}
