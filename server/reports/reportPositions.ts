import type { SurveyPositionDto, SurveySummaryDto } from '../../shared/api/results'
import type { PdfWriter } from './pdfWriter'
import { drawTable } from './pdfTable'
import { surveyKey } from './reportBandTable'

const STATE_TEXT: Record<SurveyPositionDto['state'], string> = {
  analysed: 'analysed',
  'not-analysed': 'not analysed in these bands',
  pending: 'analysis pending',
  failed: 'analysis failed',
}

export const positionLabel = (p: SurveyPositionDto) => p.receiverLabel || p.originalName

/** Per survey: which positions were used and which were left out, with the reason. */
export function drawPositions(writer: PdfWriter, summaries: SurveySummaryDto[]): void {
  summaries.forEach((summary, index) => {
    const used = summary.positions.filter((p) => p.isIncluded && p.state === 'analysed').length
    writer.write(`${surveyKey(index)} ${summary.survey.name}: ${used} of ${summary.positions.length} positions used`, { size: 9.5, bold: true })
    if (summary.survey.treatmentDescription) writer.write(`Treatment: ${summary.survey.treatmentDescription}`, { size: 8.5, color: '#555555' })
    writer.gap(2)
    const rows = summary.positions.map((p, i) => [
      `P${i + 1}`,
      positionLabel(p),
      p.sourceLabel || '—',
      p.kind === 'sweep' ? 'sweep' : 'impulse',
      p.isIncluded ? (p.state === 'analysed' ? 'used' : 'not used') : 'excluded',
      p.isIncluded ? STATE_TEXT[p.state] : `Reason: ${p.exclusionReason ?? 'not given'}`,
    ])
    drawTable(writer, [
      { header: '#', width: 24 },
      { header: 'Receiver position', width: 130 },
      { header: 'Source', width: 90 },
      { header: 'Signal', width: 48 },
      { header: 'Used', width: 52 },
      { header: 'Note', width: writer.contentWidth() - 344 },
    ], rows.length > 0 ? rows : [['—', 'No captures', '', '', '', '']])
  })
}

/** Appendix: the T30 of every position per band (excluded positions shown and marked). */
export function drawPositionValues(writer: PdfWriter, summaries: SurveySummaryDto[]): void {
  const perTable = 7
  summaries.forEach((summary, index) => {
    writer.write(`${surveyKey(index)} ${summary.survey.name}: T30 (s) per position`, { size: 9.5, bold: true })
    const positions = summary.positions
    if (positions.length === 0) {
      writer.write('No captures.', { size: 8.5 })
      return
    }
    for (let start = 0; start < positions.length; start += perTable) {
      const chunk = positions.slice(start, start + perTable)
      const centres = [...new Set(summary.positions.flatMap((p) => p.bands.map((b) => b.centreHz)))].sort((a, b) => a - b)
      const legend = chunk.map((p, i) => `P${start + i + 1} = ${positionLabel(p)}${p.isIncluded ? '' : ' (excluded)'}`).join('; ')
      writer.write(legend, { size: 7.5, color: '#555555' })
      const width = (writer.contentWidth() - 46) / chunk.length
      const rows = centres.map((hz) => [
        hz >= 1000 ? `${hz / 1000} kHz` : `${hz} Hz`,
        ...chunk.map((p) => {
          const band = p.bands.find((b) => b.centreHz === hz)
          if (!band) return '—'
          const text = band.T30 === null ? '—' : band.T30.toFixed(2)
          return `${text}${band.isFlagged ? '*' : ''}${p.isIncluded ? '' : ' (x)'}`
        }),
      ])
      drawTable(writer, [{ header: 'Band', width: 46 }, ...chunk.map((p, i) => ({ header: `P${start + i + 1}${p.isIncluded ? '' : ' (x)'}`, width, align: 'right' as const }))], rows.length > 0 ? rows : [['—', ...chunk.map(() => 'not analysed')]])
    }
  })
  writer.write('* the analysis flagged this value (decay range, B·T or fit). (x) excluded from the average.', { size: 7.5, color: '#555555' })
}
