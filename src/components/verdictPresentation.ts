import { mdiClockOutline, mdiArrowDownBoldCircleOutline, mdiArrowUpBoldCircleOutline, mdiCheckCircleOutline, mdiHelpCircleOutline, mdiMinusCircleOutline } from '@mdi/js'
import type { BandVerdict, TargetBand } from '@shared/room'
import { formatFrequencyWithUnit } from './charts/frequencyTicks'
import { formatMeasure } from '@/utils/formatMeasure'

export interface VerdictPresentation {
  label: string
  /** An SVG path from @mdi/js, so the verdict never rests on colour alone. */
  icon: string
  /** A Vuetify theme colour name. */
  color: string
}

const PRESENTATION: Record<BandVerdict, VerdictPresentation> = {
  inside: { label: 'Inside target', icon: mdiCheckCircleOutline, color: 'success' },
  'too-live': { label: 'Too live', icon: mdiArrowUpBoldCircleOutline, color: 'warning' },
  'too-dead': { label: 'Too dead', icon: mdiArrowDownBoldCircleOutline, color: 'info' },
  'not-reliable': { label: 'Not reliable', icon: mdiHelpCircleOutline, color: 'secondary' },
  'not-analysed': { label: 'Not analysed', icon: mdiClockOutline, color: 'on-surface-variant' },
  'no-target': { label: 'No target', icon: mdiMinusCircleOutline, color: 'on-surface-variant' },
}

export function verdictPresentation(verdict: BandVerdict): VerdictPresentation {
  return PRESENTATION[verdict]
}

/** "0.20–0.30 s", "at most 0.40 s", "at least 0.20 s" or "no limit". */
export function formatTargetRange(target: Pick<TargetBand, 'minS' | 'maxS'> | undefined): string {
  if (!target || (target.minS === null && target.maxS === null)) return 'no limit'
  if (target.minS !== null && target.maxS !== null) return `${formatMeasure(target.minS, 2)}–${formatMeasure(target.maxS, 2)} s`
  if (target.maxS !== null) return `at most ${formatMeasure(target.maxS, 2)} s`
  return `at least ${formatMeasure(target.minS, 2)} s`
}

/** Tooltip line: "125 Hz: measured 0.52 s, target 0.20–0.30 s — too live." */
export function describeVerdict(centreHz: number, measuredS: number | null, target: TargetBand | undefined, verdict: BandVerdict): string {
  const measured = verdict === 'not-analysed' ? 'not analysed in these bands yet' : measuredS === null ? 'not measured' : `measured ${formatMeasure(measuredS, 2, 's')}`
  const flagged = verdict === 'not-reliable' && measuredS !== null ? ' (flagged by the analysis, so not judged)' : ''
  const range = formatTargetRange(target)
  const targetText = range === 'no limit' ? 'no target limit' : `target ${range}`
  return `${formatFrequencyWithUnit(centreHz)}: ${measured}${flagged}, ${targetText} — ${PRESENTATION[verdict].label.toLowerCase()}.`
}
