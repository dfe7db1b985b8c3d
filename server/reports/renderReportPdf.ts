import PDFDocument from 'pdfkit'
import SVGtoPDF from 'svg-to-pdfkit'
import type { ReportSnapshot } from '../../shared/api/reportRevisions'
import { responseOverlaySvg, reverberationOverlaySvg } from './comparisonCharts'
import { PdfWriter } from './pdfWriter'
import { drawCoverPage } from './reportCoverPage'
import { drawBandTable, drawSurveyLegend } from './reportBandTable'
import { drawPositions, drawPositionValues } from './reportPositions'
import { drawMethod } from './reportMethod'

const TEAL = '#0b5d5e'
const MARGINS = { top: 50, bottom: 55, left: 50, right: 50 }

function heading(writer: PdfWriter, text: string, space = 40): void {
  writer.ensureSpace(space)
  writer.gap(8)
  writer.write(text, { size: 13, bold: true, color: TEAL })
  writer.gap(3)
}

function chart(writer: PdfWriter, title: string, svg: string): void {
  heading(writer, title, 250)
  const { doc } = writer
  const fontName = writer.chartFontName()
  SVGtoPDF(doc, svg, doc.page.margins.left, doc.y, { width: writer.contentWidth(), height: 210, fontCallback: () => fontName })
  doc.y += 220
}

/** Footer of every page: the room, the revision and "page i of n" (drawn once all pages exist). */
function drawFooters(writer: PdfWriter, snapshot: ReportSnapshot, isDraft: boolean): void {
  const { doc } = writer
  const range = doc.bufferedPageRange()
  const room = snapshot.comparison.roomName.length > 60 ? `${snapshot.comparison.roomName.slice(0, 59)}…` : snapshot.comparison.roomName
  const revision = isDraft ? 'draft preview, not sent' : `revision ${snapshot.revisionNumber}`
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i)
    const bottom = doc.page.margins.bottom
    doc.page.margins.bottom = 0
    const width = writer.contentWidth()
    writer.write(`${room} · ${revision}`, { size: 7.5, color: '#777777' }, { x: doc.page.margins.left, y: doc.page.height - 38, width: width - 90 })
    writer.write(`Page ${i + 1} of ${range.count}`, { size: 7.5, color: '#777777', align: 'right' }, { x: doc.page.margins.left + width - 90, y: doc.page.height - 38, width: 90 })
    doc.page.margins.bottom = bottom
  }
}

/**
 * The report as a PDF: first page with the consultancy, client, room, date and the verdict in
 * plain words; then the surveys and positions used, the band table with σ, the charts, the method
 * notes and cautions, and the per-position values as an appendix. Every page has a number.
 * Text of any script is printed in a Noto font that has it.
 */
export function renderReportPdf(snapshot: ReportSnapshot, options: { logo: Buffer | null; isDraft: boolean }): Promise<Buffer> {
  const { comparison } = snapshot
  const doc = new PDFDocument({
    size: 'A4',
    margins: MARGINS,
    bufferPages: true,
    info: { Title: `Acoustic report: ${comparison.roomName}`, Creator: 'Ringdown', CreationDate: new Date(snapshot.frozenAt) },
  })
  const chunks: Buffer[] = []
  doc.on('data', (chunk: Buffer) => chunks.push(chunk))
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)))
    doc.on('error', reject)
  })
  const writer = new PdfWriter(doc)
  try {
    drawCoverPage(writer, snapshot, options)
    const wide = comparison.surveys.length > 3
    writer.addPage(wide ? 'landscape' : 'portrait')
    heading(writer, 'Reverberation time per band')
    drawSurveyLegend(writer, comparison)
    drawBandTable(writer, comparison)
    if (wide) writer.addPage('portrait')
    heading(writer, 'Surveys and positions')
    drawPositions(writer, comparison.surveys.map((s) => s.summary))
    chart(writer, 'Reverberation time and target', reverberationOverlaySvg(comparison))
    chart(writer, 'Averaged frequency response (power average over the positions used)', responseOverlaySvg(comparison))
    drawMethod(writer, snapshot)
    writer.addPage('portrait')
    heading(writer, 'Appendix: values per position')
    drawPositionValues(writer, comparison.surveys.map((s) => s.summary))
    drawFooters(writer, snapshot, options.isDraft)
  } finally {
    writer.close()
  }
  doc.end()
  return done
}
