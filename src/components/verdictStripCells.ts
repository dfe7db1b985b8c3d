import { bandVerdicts, type BandVerdict, type MeasuredBand, type TargetMask } from '@shared/room'
import { formatFrequencyHz } from './charts/frequencyTicks'
import { describeVerdict, verdictPresentation, type VerdictPresentation } from './verdictPresentation'
import { formatMeasure } from '@/utils/formatMeasure'

export interface VerdictCell extends VerdictPresentation {
  centreHz: number
  bandLabel: string
  verdict: BandVerdict
  /** "0.42 s" or "—". */
  valueText: string
  /** Measured vs target in words, for the tooltip and screen readers. */
  description: string
}

/** One cell per band of the mask: the verdict from bandVerdicts, with its label, icon and reading. */
export function verdictStripCells(measured: readonly MeasuredBand[], mask: TargetMask): VerdictCell[] {
  return bandVerdicts(measured, mask).map(({ centreHz, verdict }) => {
    const match = measured.find((m) => Math.abs(m.centreHz / centreHz - 1) < 0.01)
    const valueS = match?.reverberationTimeS ?? null
    const target = mask.bands.find((b) => b.centreHz === centreHz)
    return {
      ...verdictPresentation(verdict),
      centreHz,
      bandLabel: formatFrequencyHz(centreHz),
      verdict,
      valueText: formatMeasure(valueS, 2, 's'),
      description: describeVerdict(centreHz, valueS, target, verdict),
    }
  })
}
