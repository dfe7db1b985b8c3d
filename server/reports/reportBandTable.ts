import type { ComparisonDto, SurveyBandReading } from '../../shared/api/results'
import type { PdfWriter } from './pdfWriter'
import { drawTable, type TableColumn } from './pdfTable'
import { hzLabel, verdictText } from './reportTexts'

const fmt = (value: number | null | undefined, digits = 2) => (value === null || value === undefined ? '—' : value.toFixed(digits))

/** "S1", "S2" … keys the tables and charts use, so long names never squeeze a column. */
export const surveyKey = (index: number) => `S${index + 1}`

function readingText(reading: SurveyBandReading | undefined): string {
  if (!reading || !reading.isAnalysed) return 'n/a'
  return `${fmt(reading.reverberationTimeS)}${reading.isReliable ? '' : '*'}`
}

/** The legend of the survey keys: "S1 = Bare room (before), measured 2026-03-01". */
export function drawSurveyLegend(writer: PdfWriter, comparison: ComparisonDto): void {
  const count = comparison.surveys.length
  comparison.surveys.forEach(({ summary }, index) => {
    const role = index === 0 ? ' (before)' : index === count - 1 ? ' (after)' : ''
    writer.write(`${surveyKey(index)} = ${summary.survey.name}${role}, measured ${summary.survey.measuredOn}`, { size: 8.5 })
  })
  writer.gap(4)
}

/**
 * Per band: each survey's judged T with its σ (ISO 3382-2 Annex A), the change first → last, the
 * target limits and the verdict of the last survey.
 */
export function drawBandTable(writer: PdfWriter, comparison: ComparisonDto): void {
  const count = comparison.surveys.length
  const available = writer.contentWidth()
  const fixed = { band: 46, change: 48, target: 62, verdict: 66 }
  const perSurvey = (available - fixed.band - fixed.change - fixed.target - fixed.verdict) / count
  const columns: TableColumn[] = [
    { header: 'Band', width: fixed.band },
    ...comparison.surveys.flatMap((_, i) => [
      { header: `${surveyKey(i)} T (s)`, width: perSurvey * 0.55, align: 'right' as const },
      { header: `${surveyKey(i)} σ (s)`, width: perSurvey * 0.45, align: 'right' as const },
    ]),
    { header: 'Change (s)', width: fixed.change, align: 'right' },
    { header: 'Target (s)', width: fixed.target, align: 'right' },
    { header: `Verdict ${surveyKey(count - 1)}`, width: fixed.verdict },
  ]
  const last = comparison.surveys[count - 1]!
  const rows = comparison.differences.map((difference) => {
    const target = comparison.target?.bands.find((b) => b.centreHz === difference.centreHz)
    const verdict = last.verdicts.find((v) => v.centreHz === difference.centreHz)?.verdict
    const limits = !target || (target.minS === null && target.maxS === null) ? 'no limit' : `${fmt(target.minS)}–${fmt(target.maxS)}`
    return [
      hzLabel(difference.centreHz),
      ...comparison.surveys.flatMap(({ summary }) => {
        const reading = summary.readings.find((r) => r.centreHz === difference.centreHz)
        return [readingText(reading), reading?.isAnalysed ? fmt(reading.uncertaintyS, 3) : '—']
      }),
      difference.changeS === null ? '—' : `${difference.changeS > 0 ? '+' : ''}${difference.changeS.toFixed(2)}`,
      comparison.target ? limits : '—',
      verdict ? verdictText(verdict) : '—',
    ]
  })
  drawTable(writer, columns, rows)
  writer.write(`T: mean T30 over the positions used (T20 where T30 was flagged). Change: ${surveyKey(count - 1)} minus ${surveyKey(0)}. * not reliable: a position flagged the value, so the band is not judged. n/a: no position analysed in this band. σ: standard uncertainty of the mean (ISO 3382-2:2008 Annex A).`, { size: 7.5, color: '#555555' })
}
