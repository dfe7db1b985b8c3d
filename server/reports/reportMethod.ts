import { describeAnalysisSettings } from '../../shared/jobs/describeAnalysisSettings'
import { targetCitationText } from '../../shared/room/targets/targetCitationText'
import type { ReportSnapshot, ReportSurveyMethod } from '../../shared/api/reportRevisions'
import type { PdfWriter } from './pdfWriter'
import { surveyKey } from './reportBandTable'
import { METHOD_NOTES, REPORT_CAUTIONS } from './reportTexts'

const TEAL = '#0b5d5e'

function heading(writer: PdfWriter, text: string): void {
  writer.gap(6)
  writer.write(text, { size: 12, bold: true, color: TEAL })
  writer.gap(2)
}

function signalText(method: ReportSurveyMethod): string {
  const parts = []
  if (method.impulseCount > 0) parts.push(`${method.impulseCount} impulse response${method.impulseCount === 1 ? '' : 's'}`)
  if (method.sweepCount > 0) parts.push(`${method.sweepCount} sweep recording${method.sweepCount === 1 ? '' : 's'} (${method.sweeps.join('; ')})`)
  return parts.length > 0 ? parts.join(', ') : 'no capture used'
}

function equipmentText(method: ReportSurveyMethod): string {
  const { microphone, loudspeaker, audioInterface } = method.equipment
  const parts = [microphone && `microphone ${microphone}`, loudspeaker && `sound source ${loudspeaker}`, audioInterface && `audio interface ${audioInterface}`].filter(Boolean)
  return parts.length > 0 ? parts.join('; ') : 'not recorded'
}

function conditionsText(method: ReportSurveyMethod): string {
  const parts = [method.temperatureC !== null && `${method.temperatureC} °C`, method.humidityPercent !== null && `${method.humidityPercent} % relative humidity`].filter(Boolean)
  return parts.length > 0 ? parts.join(', ') : 'not recorded'
}

/** Method notes: signal, equipment, analysis settings, engine version, target; then the cautions. */
export function drawMethod(writer: PdfWriter, snapshot: ReportSnapshot): void {
  heading(writer, 'Method')
  for (const note of METHOD_NOTES) writer.write(`• ${note}`, { size: 8.5 })
  snapshot.methods.forEach((method, index) => {
    writer.gap(4)
    writer.write(`${surveyKey(index)} ${method.name}, measured ${method.measuredOn}`, { size: 9, bold: true })
    writer.write(`Signal: ${signalText(method)}.`, { size: 8.5 })
    writer.write(`Equipment: ${equipmentText(method)}.`, { size: 8.5 })
    writer.write(`Air: ${conditionsText(method)}.`, { size: 8.5 })
    writer.write(`Analysis settings: ${describeAnalysisSettings(method.analysisSettings)}.`, { size: 8.5 })
  })
  writer.gap(4)
  writer.write(`Analysis engine: Ringdown ${snapshot.engineVersions.length > 0 ? snapshot.engineVersions.join(', ') : 'version not recorded'}.`, { size: 8.5 })
  const target = snapshot.comparison.target
  if (target) {
    writer.gap(4)
    writer.write(`Target: ${target.name}. ${targetCitationText(target)}.`, { size: 8.5 })
    for (const note of target.notes) writer.write(note, { size: 8.5 })
  }
  writer.write(snapshot.comparison.targetCaution, { size: 8.5 })
  heading(writer, 'Cautions')
  for (const caution of REPORT_CAUTIONS) writer.write(`• ${caution}`, { size: 8.5 })
}
