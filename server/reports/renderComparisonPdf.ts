import PDFDocument from 'pdfkit'
import SVGtoPDF from 'svg-to-pdfkit'
import { createRequire } from 'node:module'
import type { ComparisonDto } from '../../shared/api/results'
import { responseOverlaySvg, reverberationOverlaySvg } from './comparisonCharts'
import { METHOD_NOTES, REPORT_CAUTIONS, verdictText } from './reportTexts'

const require = createRequire(import.meta.url)
const FONT_REGULAR = require.resolve('@fontsource/noto-sans/files/noto-sans-latin-400-normal.woff')
const FONT_BOLD = require.resolve('@fontsource/noto-sans/files/noto-sans-latin-700-normal.woff')

const fmt = (value: number | null, digits = 2) => (value === null ? '—' : value.toFixed(digits))
const hz = (value: number) => (value >= 1000 ? `${value / 1000} kHz` : `${value} Hz`)

function bandTable(doc: PDFKit.PDFDocument, comparison: ComparisonDto) {
  const names = comparison.surveys.map((s) => s.summary.survey.name)
  const columns = ['Band', ...names.map((n) => `${n} T (s)`), 'Change (s)', 'Target (s)', `Verdict: ${names[names.length - 1]}`]
  const widths = [52, ...names.map(() => 78), 58, 70, 110]
  const startX = doc.page.margins.left
  let y = doc.y
  const row = (cells: string[], bold = false) => {
    doc.font(bold ? 'bold' : 'regular').fontSize(8)
    let x = startX
    cells.forEach((cell, i) => {
      doc.text(cell, x, y, { width: widths[i]! - 4 })
      x += widths[i]!
    })
    y += 14
  }
  row(columns, true)
  const last = comparison.surveys[comparison.surveys.length - 1]!
  for (const difference of comparison.differences) {
    const target = comparison.target?.bands.find((b) => b.centreHz === difference.centreHz)
    const verdict = last.verdicts.find((v) => v.centreHz === difference.centreHz)?.verdict
    row([
      hz(difference.centreHz),
      ...comparison.surveys.map((s) => fmt(s.summary.readings.find((r) => r.centreHz === difference.centreHz)?.reverberationTimeS ?? null)),
      difference.changeS === null ? '—' : `${difference.changeS > 0 ? '+' : ''}${difference.changeS.toFixed(2)}`,
      target && (target.minS !== null || target.maxS !== null) ? `${fmt(target.minS)}–${fmt(target.maxS)}` : 'no limit',
      verdict ? verdictText(verdict) : '—',
    ])
  }
  doc.x = startX
  doc.y = y + 6
}

/** The comparison as a PDF: room, surveys, band table, overlays, target and verdict, method, cautions. */
export function renderComparisonPdf(comparison: ComparisonDto, meta: { generatedAt: Date; preparedBy: string | null }): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margins: { top: 50, bottom: 50, left: 50, right: 50 }, info: { Title: `Acoustic report — ${comparison.roomName}`, Creator: 'Ringdown' } })
  doc.registerFont('regular', FONT_REGULAR)
  doc.registerFont('bold', FONT_BOLD)
  const chunks: Buffer[] = []
  doc.on('data', (chunk: Buffer) => chunks.push(chunk))
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))))

  doc.font('bold').fontSize(18).fillColor('#0b5d5e').text(`Acoustic report: ${comparison.roomName}`)
  doc.font('regular').fontSize(9).fillColor('#333333')
  doc.text(`Prepared ${meta.generatedAt.toISOString().slice(0, 10)}${meta.preparedBy ? ` by ${meta.preparedBy}` : ''} with Ringdown. Volume ${comparison.volumeM3 === null ? 'unknown' : `${comparison.volumeM3.toFixed(1)} m³`}; ${comparison.bandResolution === 'octave' ? 'octave' : 'third-octave'} bands.`)
  doc.moveDown(0.5)
  doc.font('bold').fontSize(11).text('Summary')
  doc.font('regular').fontSize(10).text(comparison.summaryLine ?? 'No target applies to this room (its volume is unknown or outside the target formula’s range).')
  doc.moveDown(0.5)
  doc.font('bold').fontSize(11).text('Surveys compared')
  doc.font('regular').fontSize(9)
  for (const entry of comparison.surveys) {
    const s = entry.summary
    doc.text(`• ${s.survey.name} — ${s.survey.measuredOn}; ${s.analysedCount} of ${s.captureCount} positions analysed${s.survey.treatmentDescription ? `; ${s.survey.treatmentDescription}` : ''}`)
  }
  doc.moveDown(0.5)
  doc.font('bold').fontSize(11).text(`Reverberation time per band${comparison.target ? ` against ${comparison.target.name}` : ''}`)
  doc.moveDown(0.3)
  bandTable(doc, comparison)
  if (comparison.target) doc.font('regular').fontSize(7.5).fillColor('#555555').text(`Target source: ${comparison.target.source}. ${comparison.target.notes.join(' ')}`).fillColor('#333333')
  doc.moveDown(0.5)
  doc.font('bold').fontSize(11).text('Reverberation time and target')
  SVGtoPDF(doc, reverberationOverlaySvg(comparison), doc.page.margins.left, doc.y + 4, { width: 495, height: 210, fontCallback: () => 'regular' })
  doc.y += 220
  doc.addPage()
  doc.font('bold').fontSize(11).text('Averaged frequency response (power average over positions)')
  SVGtoPDF(doc, responseOverlaySvg(comparison), doc.page.margins.left, doc.y + 4, { width: 495, height: 210, fontCallback: () => 'regular' })
  doc.y += 220
  doc.font('bold').fontSize(11).text('Method')
  doc.font('regular').fontSize(8.5)
  for (const note of METHOD_NOTES) doc.text(`• ${note}`)
  doc.moveDown(0.5)
  doc.font('bold').fontSize(11).text('Cautions')
  doc.font('regular').fontSize(8.5)
  for (const caution of REPORT_CAUTIONS) doc.text(`• ${caution}`)
  doc.end()
  return done
}
