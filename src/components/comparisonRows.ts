import type { ComparisonDifference } from '@shared/api'
import { formatFrequencyHz } from './charts/frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'

export interface ComparisonRow {
  centreHz: number
  bandLabel: string
  beforeText: string
  afterText: string
  changeText: string
  changePercentText: string
  /** 'shorter' / 'longer' / null (no change computable or zero). */
  direction: 'shorter' | 'longer' | null
}

function signed(value: number | null, decimals: number, unit = ''): string {
  if (value === null || !Number.isFinite(value)) return formatMeasure(null, decimals)
  const text = formatMeasure(value, decimals, unit)
  return value > 0 && Number(value.toFixed(decimals)) > 0 ? `+${text}` : text
}

/** Table rows of the first-versus-last differences: times in s, change in s and % (signed). */
export function comparisonRows(differences: readonly ComparisonDifference[]): ComparisonRow[] {
  return differences.map((d) => ({
    centreHz: d.centreHz,
    bandLabel: formatFrequencyHz(d.centreHz),
    beforeText: formatMeasure(d.beforeS, 2),
    afterText: formatMeasure(d.afterS, 2),
    changeText: signed(d.changeS, 2),
    changePercentText: signed(d.changePercent, 0, '%'),
    direction: d.changeS === null || d.changeS === 0 ? null : d.changeS < 0 ? 'shorter' : 'longer',
  }))
}
