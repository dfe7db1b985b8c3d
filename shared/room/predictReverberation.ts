import { airEnergyAbsorptionPerM, type AirConditions } from './airAbsorption'
import { absorptionAt, findMaterial, MATERIALS, type AbsorptionMaterial } from './materials'
import { eyringReverberationTimeS, sabineConstant, sabineReverberationTimeS } from './reverberationFormulas'
import type { SurfaceArea } from './roomSurfaces'
import { speedOfSoundMps } from './speedOfSound'

export interface AddedAbsorber {
  name: string
  materialId: string
  /** Area of one item, m² (ignored for 'object' materials, whose value is already m² per item). */
  areaM2: number
  count: number
  /** Surface name the items cover; that much of the surface's own absorption is removed. */
  mountedOn?: string
}

export interface PredictionInput {
  volumeM3: number
  surfaces: readonly SurfaceArea[]
  absorbers?: readonly AddedAbsorber[]
  /** Band centres, Hz (default octaves 125–4000). */
  bandsHz?: readonly number[]
  /** Air state for c and the 4mV term (defaults 20 °C, 50 %, 101.325 kPa). */
  air?: AirConditions
  /** Include air absorption 4mV (default true). */
  includeAirAbsorption?: boolean
  materials?: readonly AbsorptionMaterial[]
}

export interface PredictedBand {
  centreHz: number
  /** A = Σ S·α + absorbers, m² (null where a material has no value in this band). */
  absorptionAreaM2: number | null
  /** 4mV, m². */
  airAbsorptionM2: number
  /** ᾱ = A/S. */
  meanAbsorption: number | null
  sabineS: number | null
  eyringS: number | null
  /** Materials with no coefficient in this band. */
  missingMaterials: string[]
}

/**
 * Predicted reverberation time per band by Sabine T = K·V/(A + 4mV) and Eyring
 * T = K·V/(−S·ln(1 − ᾱ) + 4mV), K = 24·ln10/c, c from the air temperature, m from ISO 9613-1 at
 * the band centre (facts §8). Absorbers add area × count × α; mounted ones replace the surface
 * they cover. An estimate: both formulas assume a diffuse field, which small rooms lack below the
 * Schroeder frequency.
 */
export function predictReverberation(input: PredictionInput): { surfaceAreaM2: number; bands: PredictedBand[] } {
  const { volumeM3, surfaces, absorbers = [], bandsHz = [125, 250, 500, 1000, 2000, 4000], air = {}, includeAirAbsorption = true, materials = MATERIALS } = input
  if (!(volumeM3 > 0)) throw new RangeError('volumeM3 must be positive')
  const constantK = sabineConstant(speedOfSoundMps(air.temperatureC ?? 20))
  const covered = coveredAreas(surfaces, absorbers)
  const surfaceAreaM2 = surfaces.reduce((sum, s) => sum + s.areaM2, 0)
  const bands = bandsHz.map((centreHz): PredictedBand => {
    const missing = new Set<string>()
    const valueOf = (materialId: string) => {
      const value = absorptionAt(findMaterial(materialId, materials), centreHz)
      if (value === null) missing.add(materialId)
      return value ?? 0
    }
    let area = 0
    for (const surface of surfaces) area += (surface.areaM2 - (covered.get(surface.name) ?? 0)) * valueOf(surface.materialId)
    for (const absorber of absorbers) {
      const perItem = findMaterial(absorber.materialId, materials).kind === 'object' ? 1 : absorber.areaM2
      area += perItem * absorber.count * valueOf(absorber.materialId)
    }
    const airAbsorptionM2 = includeAirAbsorption ? 4 * airEnergyAbsorptionPerM(centreHz, air) * volumeM3 : 0
    if (missing.size > 0) {
      return { centreHz, absorptionAreaM2: null, airAbsorptionM2, meanAbsorption: null, sabineS: null, eyringS: null, missingMaterials: [...missing] }
    }
    const meanAbsorption = area / surfaceAreaM2
    return {
      centreHz,
      absorptionAreaM2: area,
      airAbsorptionM2,
      meanAbsorption,
      sabineS: sabineReverberationTimeS(volumeM3, area, constantK, airAbsorptionM2),
      eyringS: eyringReverberationTimeS(volumeM3, surfaceAreaM2, meanAbsorption, constantK, airAbsorptionM2),
      missingMaterials: [],
    }
  })
  return { surfaceAreaM2, bands }
}

/** Area each surface loses under mounted absorbers, m²; throws when a surface is over-covered. */
function coveredAreas(surfaces: readonly SurfaceArea[], absorbers: readonly AddedAbsorber[]): Map<string, number> {
  const covered = new Map<string, number>()
  for (const absorber of absorbers) {
    if (!absorber.mountedOn) continue
    const surface = surfaces.find((s) => s.name === absorber.mountedOn)
    if (!surface) throw new RangeError(`absorber '${absorber.name}' is mounted on unknown surface '${absorber.mountedOn}'`)
    const total = (covered.get(surface.name) ?? 0) + absorber.areaM2 * absorber.count
    if (total > surface.areaM2 + 1e-9) throw new RangeError(`absorbers cover ${total.toFixed(2)} m² of the ${surface.name}, which has ${surface.areaM2.toFixed(2)} m²`)
    covered.set(surface.name, total)
  }
  return covered
}
