import type { AnalysisWarning, BandResult } from '@shared/types/analysis'
import { formatFrequencyHz } from './charts/frequencyTicks'
import { formatMeasure, fractionToPercent, secondsToMilliseconds } from '@/utils/formatMeasure'

export type BandColumnKey = 'T20' | 'T30' | 'EDT' | 'C50' | 'C80' | 'D50' | 'Ts' | 'decayRangeDb' | 'uncertaintyT20' | 'uncertaintyT30'

export interface BandColumn {
  key: BandColumnKey
  title: string
  /** The parameter name warnings refer to (AnalysisWarning.parameters). */
  parameter: string
  decimals: number
  /** Stored value → displayed number (D50 0..1 → %, Ts s → ms). */
  read: (band: BandResult) => number | null
}

export const BAND_COLUMNS: readonly BandColumn[] = [
  { key: 'T20', title: 'T20 (s)', parameter: 'T20', decimals: 2, read: (b) => b.T20 },
  { key: 'T30', title: 'T30 (s)', parameter: 'T30', decimals: 2, read: (b) => b.T30 },
  { key: 'EDT', title: 'EDT (s)', parameter: 'EDT', decimals: 2, read: (b) => b.EDT },
  { key: 'C50', title: 'C50 (dB)', parameter: 'C50', decimals: 1, read: (b) => b.C50 },
  { key: 'C80', title: 'C80 (dB)', parameter: 'C80', decimals: 1, read: (b) => b.C80 },
  { key: 'D50', title: 'D50 (%)', parameter: 'D50', decimals: 0, read: (b) => fractionToPercent(b.D50) },
  { key: 'Ts', title: 'Ts (ms)', parameter: 'Ts', decimals: 0, read: (b) => secondsToMilliseconds(b.Ts) },
  { key: 'decayRangeDb', title: 'Decay range (dB)', parameter: 'decayRange', decimals: 1, read: (b) => b.decayRangeDb },
  { key: 'uncertaintyT20', title: 'σ(T20) (s)', parameter: 'T20', decimals: 2, read: (b) => b.uncertaintyT20 },
  { key: 'uncertaintyT30', title: 'σ(T30) (s)', parameter: 'T30', decimals: 2, read: (b) => b.uncertaintyT30 },
]

export interface BandCell {
  /** Formatted number, or null when not computable. */
  text: string | null
  /** True when a warning qualifies this parameter: the value is shown, but marked. */
  isFlagged: boolean
}

export interface BandTableRow {
  centreHz: number
  bandLabel: string
  cells: Record<BandColumnKey, BandCell>
  warnings: AnalysisWarning[]
}

function isFlagged(warnings: readonly AnalysisWarning[], parameter: string): boolean {
  return warnings.some((w) => w.parameters.length === 0 || w.parameters.includes(parameter))
}

/** Table rows of band results in display units; null values stay null (shown as "—"). */
export function bandTableRows(bands: readonly BandResult[]): BandTableRow[] {
  return bands.map((band) => {
    const cells = {} as Record<BandColumnKey, BandCell>
    for (const column of BAND_COLUMNS) {
      const value = column.read(band)
      cells[column.key] = {
        text: value === null || !Number.isFinite(value) ? null : formatMeasure(value, column.decimals),
        isFlagged: column.key.startsWith('uncertainty') ? false : isFlagged(band.warnings, column.parameter),
      }
    }
    return { centreHz: band.centreHz, bandLabel: formatFrequencyHz(band.centreHz), cells, warnings: band.warnings }
  })
}
