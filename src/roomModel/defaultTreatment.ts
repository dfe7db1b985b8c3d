import type { TreatmentDto } from '@shared/api'

/**
 * The plan shown before one is saved: a bare room of hard, plastered surfaces on a hard floor
 * (built-in library ids), no openings and no absorbers — the state treatment starts from.
 */
export function defaultTreatment(): TreatmentDto {
  return {
    surfaceMaterials: { floor: 'hard-surface', ceiling: 'plaster-on-brick', walls: 'plaster-on-brick' },
    openings: [],
    absorbers: [],
  }
}
