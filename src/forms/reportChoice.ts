import type { SurveyDto } from '@shared/api'

/** Before and after by default: the first and the last survey in date order (none with fewer than two). */
export function defaultReportSurveyIds(surveysInDateOrder: readonly SurveyDto[]): number[] {
  const first = surveysInDateOrder[0]
  const last = surveysInDateOrder[surveysInDateOrder.length - 1]
  return first && last && first.id !== last.id ? [first.id, last.id] : []
}

/** The expiry choices offered for links, in days; null = until revoked. */
export const LINK_EXPIRY_ITEMS: { title: string; value: number | null }[] = [
  { title: '7 days', value: 7 },
  { title: '30 days', value: 30 },
  { title: '90 days', value: 90 },
  { title: 'One year', value: 365 },
  { title: 'Until revoked', value: null },
]
