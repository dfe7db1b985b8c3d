import { Survey } from '../models'
import { ValidationError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import { bandVerdicts, type MeasuredBand } from '../../shared/room/targets/bandVerdict'
import { summarizeVerdictChange } from '../../shared/room/targets/verdictChangeSummary'
import { TARGET_GENERAL_CAUTION } from '../../shared/room/targets/targetCitationText'
import type { ComparisonDifference, ComparisonDto, SurveySummaryDto } from '../../shared/api/results'
import type { BandResolution } from '../../shared/types/analysis'
import type { Room } from '../models'
import { summariseSurvey } from './surveySummaryService'
import { describeSurvey } from './surveysService'
import { roomTargetMask } from './roomTargetService'

function toMeasured(summary: Omit<SurveySummaryDto, 'survey'>): MeasuredBand[] {
  return summary.readings.map((r) => ({ centreHz: r.centreHz, reverberationTimeS: r.reverberationTimeS, isReliable: r.isReliable, isAnalysed: r.isAnalysed }))
}

function differencesOf(before: MeasuredBand[], after: MeasuredBand[], centresHz: readonly number[]): ComparisonDifference[] {
  return centresHz.map((centreHz) => {
    const beforeS = before.find((b) => b.centreHz === centreHz)?.reverberationTimeS ?? null
    const afterS = after.find((a) => a.centreHz === centreHz)?.reverberationTimeS ?? null
    const changeS = beforeS !== null && afterS !== null ? afterS - beforeS : null
    return { centreHz, beforeS, afterS, changeS, changePercent: changeS !== null && beforeS ? (100 * changeS) / beforeS : null }
  })
}

const bandWords = (bands: BandResolution) => (bands === 'octave' ? 'octave bands' : 'third-octave bands')

/** Why a comparison is not ready to be sent: positions not analysed at this resolution, still pending or failed. */
function reportBlockersOf(summaries: SurveySummaryDto[], bands: BandResolution): string[] {
  return summaries.flatMap((s) => {
    const name = `“${s.survey.name}”`
    if (s.includedCount === 0) return [`${name} has no included capture.`]
    const problems: string[] = []
    if (s.pendingCount > 0) problems.push(`${name}: ${s.pendingCount} of ${s.includedCount} positions are still being analysed; wait for them.`)
    if (s.failedCount > 0) problems.push(`${name}: the analysis of ${s.failedCount} position(s) failed; exclude them with a reason or upload them again.`)
    const missing = s.includedCount - s.analysedCount - s.pendingCount - s.failedCount
    if (missing > 0) problems.push(`${name}: ${s.analysedCount} of ${s.includedCount} positions are analysed in ${bandWords(bands)}; analyse the whole survey in ${bandWords(bands)} first.`)
    return problems
  })
}

/** Two or more surveys of one room side by side, judged against the room's target. */
export async function compareSurveys(userId: number, roomId: number, surveyIds: number[], bands: BandResolution): Promise<ComparisonDto> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:read')
  return compareSurveysOfRoom(room, surveyIds, bands)
}

/** The comparison itself, for a room the caller is already allowed to see. */
export async function compareSurveysOfRoom(room: Room, surveyIds: number[], bands: BandResolution): Promise<ComparisonDto> {
  const surveys = await Survey.findAll({ where: { id: surveyIds, roomId: room.id } })
  if (surveys.length !== new Set(surveyIds).size) {
    throw new ValidationError('Every survey compared must belong to this room.', { surveys: 'Every survey compared must belong to this room.' })
  }
  const ordered = surveyIds.map((id) => surveys.find((s) => s.id === id)!)
  const target = await roomTargetMask(room, bands)
  const entries = []
  for (const survey of ordered) {
    const summary = { survey: await describeSurvey(survey), ...(await summariseSurvey(survey, bands)) }
    entries.push({ summary, verdicts: target ? bandVerdicts(toMeasured(summary), target) : [] })
  }
  const before = toMeasured(entries[0]!.summary)
  const after = toMeasured(entries[entries.length - 1]!.summary)
  const centresHz = target?.bands.map((b) => b.centreHz) ?? [...new Set([...before, ...after].map((b) => b.centreHz))].sort((x, y) => x - y)
  return {
    roomId: room.id,
    roomName: room.name,
    roomClientName: room.clientName,
    roomAddress: room.address,
    volumeM3: room.effectiveVolumeM3(),
    bandResolution: bands,
    target,
    surveys: entries,
    differences: differencesOf(before, after, centresHz),
    summaryLine: target
      ? summarizeVerdictChange({ afterLabel: ordered[ordered.length - 1]!.name, before, after, mask: target, bandKind: bands === 'octave' ? 'octave' : 'third-octave' })
      : null,
    targetCaution: TARGET_GENERAL_CAUTION,
    reportBlockers: reportBlockersOf(entries.map((e) => e.summary), bands),
  }
}
