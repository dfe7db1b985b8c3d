import type { LocationQuery } from 'vue-router'
import type { BandResolution, SmoothingFraction } from '@shared/types/analysis'

/** Display smoothings on the compare page: the survey averages come at the analyses' 1/6 octave, so only coarser (or equal) is possible. */
export const COMPARE_SMOOTHINGS: readonly SmoothingFraction[] = [1, 3, 6]
export const MAX_COMPARED_SURVEYS = 6

export interface CompareState {
  /** In the order compared: the first is "before", the last "after". */
  surveyIds: number[]
  bands: BandResolution
  smoothing: SmoothingFraction
}

function firstValue(value: LocationQuery[string] | undefined): string {
  const first = Array.isArray(value) ? value[0] : value
  return typeof first === 'string' ? first : ''
}

/**
 * Reads the compare page's state from its URL query (`?surveys=3,5&bands=octave&smoothing=6`).
 * Junk is dropped rather than refused, so an edited or old link still opens: unknown ids are
 * skipped, repeats kept once, at most six; unknown bands → octave; unknown smoothing → 1/6.
 */
export function parseCompareQuery(query: LocationQuery): CompareState {
  const ids = firstValue(query.surveys)
    .split(',')
    .map((part) => part.trim())
    .filter((part) => /^\d+$/.test(part))
    .map(Number)
    .filter((id) => id > 0)
  const surveyIds = [...new Set(ids)].slice(0, MAX_COMPARED_SURVEYS)
  const bands: BandResolution = firstValue(query.bands) === 'third' ? 'third' : 'octave'
  const smoothingNumber = Number(firstValue(query.smoothing))
  const smoothing = COMPARE_SMOOTHINGS.find((s) => s === smoothingNumber) ?? 6
  return { surveyIds, bands, smoothing }
}

/** The query for a state; the inverse of parseCompareQuery for every valid state. */
export function toCompareQuery(state: CompareState): Record<string, string> {
  return { surveys: state.surveyIds.join(','), bands: state.bands, smoothing: String(state.smoothing) }
}

/** Adds or removes a survey, keeping the surveys in the given (date) order. */
export function toggleComparedSurvey(selectedIds: readonly number[], surveyId: number, idsInDateOrder: readonly number[]): number[] {
  const next = new Set(selectedIds)
  if (next.has(surveyId)) next.delete(surveyId)
  else next.add(surveyId)
  const ordered = idsInDateOrder.filter((id) => next.has(id))
  // Ids not among the room's surveys (e.g. from an old link) stay at the end until removed.
  return [...ordered, ...[...next].filter((id) => !idsInDateOrder.includes(id))].slice(0, MAX_COMPARED_SURVEYS)
}
