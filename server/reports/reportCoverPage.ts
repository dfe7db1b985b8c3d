import { bandVerdicts, type BandVerdict } from '../../shared/room/targets/bandVerdict'
import { targetCitationText } from '../../shared/room/targets/targetCitationText'
import type { ReportSnapshot } from '../../shared/api/reportRevisions'
import type { PdfWriter } from './pdfWriter'
import { hzLabel, VERDICT_GROUP_TEXT } from './reportTexts'

const TEAL = '#0b5d5e'
const GREY = '#555555'
const dateText = (iso: string) => new Intl.DateTimeFormat('en-GB', { dateStyle: 'long', timeZone: 'UTC' }).format(new Date(iso))

function consultancyBlock(writer: PdfWriter, snapshot: ReportSnapshot, logo: Buffer | null): void {
  const { doc } = writer
  const top = doc.y
  const left = doc.page.margins.left
  let textLeft = left
  if (logo) {
    try {
      doc.image(logo, left, top, { fit: [110, 55] })
      textLeft = left + 125
    } catch {
      // An image PDFKit cannot read is left out rather than failing the report.
    }
  }
  const { consultancyName, address, contact } = snapshot.profile
  const width = writer.contentWidth() - (textLeft - left)
  writer.write(consultancyName || 'Acoustic consultancy', { size: 12, bold: true, color: TEAL }, { x: textLeft, y: top, width })
  for (const line of [address, contact].filter(Boolean)) writer.write(line, { size: 9, color: GREY }, { x: textLeft, width })
  doc.y = Math.max(doc.y, logo ? top + 60 : doc.y) + 18
}

function labelled(writer: PdfWriter, label: string, value: string): void {
  writer.write(label, { size: 8, bold: true, color: GREY })
  writer.write(value, { size: 11 })
  writer.gap(6)
}

/** The last survey's bands grouped by verdict, e.g. "Too live: 63 Hz, 125 Hz". */
function verdictGroups(snapshot: ReportSnapshot): { verdict: BandVerdict; bands: number[] }[] {
  const { comparison } = snapshot
  const last = comparison.surveys[comparison.surveys.length - 1]
  if (!comparison.target || !last) return []
  const verdicts = last.verdicts.length > 0 ? last.verdicts : bandVerdicts([], comparison.target)
  const order: BandVerdict[] = ['inside', 'too-live', 'too-dead', 'not-reliable', 'not-analysed', 'no-target']
  return order.map((verdict) => ({ verdict, bands: verdicts.filter((v) => v.verdict === verdict).map((v) => v.centreHz) })).filter((g) => g.bands.length > 0)
}

/** Page 1: the consultancy, the client, the room, the date and the verdict in plain words. */
export function drawCoverPage(writer: PdfWriter, snapshot: ReportSnapshot, options: { logo: Buffer | null; isDraft: boolean }): void {
  const { comparison } = snapshot
  consultancyBlock(writer, snapshot, options.logo)
  writer.write('Acoustic measurement report', { size: 20, bold: true, color: TEAL })
  writer.write(comparison.roomName, { size: 15, bold: true })
  writer.gap(12)
  labelled(writer, 'CLIENT', comparison.roomClientName || 'not named')
  if (comparison.roomAddress) labelled(writer, 'ROOM ADDRESS', comparison.roomAddress)
  const revisionText = options.isDraft ? `Draft preview, not sent (would become revision ${snapshot.revisionNumber})` : `Revision ${snapshot.revisionNumber}`
  labelled(writer, 'DATE AND REVISION', `${dateText(snapshot.frozenAt)} · ${revisionText}`)
  if (snapshot.preparedBy) labelled(writer, 'PREPARED BY', [snapshot.preparedBy, snapshot.profile.consultancyName].filter(Boolean).join(', '))
  const first = comparison.surveys[0]!.summary.survey.name
  const last = comparison.surveys[comparison.surveys.length - 1]!.summary.survey.name
  labelled(writer, 'CONDITIONS COMPARED', comparison.surveys.map((s) => s.summary.survey.name).join(' → '))
  writer.gap(6)
  writer.write('Verdict', { size: 13, bold: true, color: TEAL })
  if (!comparison.target) {
    writer.write(`No target applies to this room yet (its volume is unknown or outside the target's range), so “${last}” is compared with “${first}” band by band without a verdict.`, { size: 10.5 })
  } else {
    writer.write(`“${last}” is judged against the target “${comparison.target.name}”: ${targetCitationText(comparison.target)}.`, { size: 10.5 })
    writer.gap(4)
    writer.write(comparison.summaryLine ?? '', { size: 10.5, bold: true })
    writer.gap(4)
    for (const group of verdictGroups(snapshot)) {
      writer.write(`${VERDICT_GROUP_TEXT[group.verdict]}: ${group.bands.map(hzLabel).join(', ')}`, { size: 9.5 }, { x: writer.doc.page.margins.left + 10 })
    }
  }
  writer.gap(10)
  writer.write(comparison.targetCaution, { size: 8.5, color: GREY })
}
