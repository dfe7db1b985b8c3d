import { Survey } from '../models'
import { ValidationError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import { targetForRoom, TARGET_IDS, OCTAVE_CENTRES_HZ, THIRD_OCTAVE_CENTRES_HZ, type TargetId } from '../../shared/room/targets/targetForRoom'
import { bandVerdicts, type MeasuredBand } from '../../shared/room/targets/bandVerdict'
import { summarizeVerdictChange } from '../../shared/room/targets/verdictChangeSummary'
import type { TargetMask } from '../../shared/room/targets/targetMask'
import type { ComparisonDifference, ComparisonDto, SurveySummaryDto } from '../../shared/api/results'
import type { BandResolution } from '../../shared/types/analysis'
import type { Room } from '../models'
import { summariseSurvey } from './surveySummaryService'
import { describeSurvey } from './surveysService'

/** The room's target mask, or null when its volume is unknown or outside the formula's range. */
function targetOf(room: Room, volumeM3: number | null, bands: BandResolution): TargetMask | null {
  if (volumeM3 === null) return null
  const targetId = (TARGET_IDS as readonly string[]).includes(room.targetProfile) ? (room.targetProfile as TargetId) : undefined
  try {
    return targetForRoom({ use: room.use, volumeM3, ...(targetId ? { targetId } : {}) }, bands === 'octave' ? OCTAVE_CENTRES_HZ : THIRD_OCTAVE_CENTRES_HZ)
  } catch {
    return null
  }
}

function toMeasured(summary: Omit<SurveySummaryDto, 'survey'>): MeasuredBand[] {
  return summary.readings.map((r) => ({ centreHz: r.centreHz, reverberationTimeS: r.reverberationTimeS, isReliable: r.isReliable }))
}

function differencesOf(before: MeasuredBand[], after: MeasuredBand[]): ComparisonDifference[] {
  return before.map((band) => {
    const match = after.find((a) => a.centreHz === band.centreHz)
    const beforeS = band.reverberationTimeS
    const afterS = match?.reverberationTimeS ?? null
    const changeS = beforeS !== null && afterS !== null ? afterS - beforeS : null
    return { centreHz: band.centreHz, beforeS, afterS, changeS, changePercent: changeS !== null && beforeS ? (100 * changeS) / beforeS : null }
  })
}

/** Two or more surveys of one room side by side, judged against the room's target. */
export async function compareSurveys(userId: number, roomId: number, surveyIds: number[], bands: BandResolution): Promise<ComparisonDto> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:read')
  return compareSurveysOfRoom(room, surveyIds, bands)
}

/** The comparison itself, for a room the caller is already allowed to see (or a share link). */
export async function compareSurveysOfRoom(room: Room, surveyIds: number[], bands: BandResolution): Promise<ComparisonDto> {
  const surveys = await Survey.findAll({ where: { id: surveyIds, roomId: room.id } })
  if (surveys.length !== new Set(surveyIds).size) {
    throw new ValidationError('Every survey compared must belong to this room.', { surveys: 'Every survey compared must belong to this room.' })
  }
  const ordered = surveyIds.map((id) => surveys.find((s) => s.id === id)!)
  const volumeM3 = room.effectiveVolumeM3()
  const target = targetOf(room, volumeM3, bands)
  const entries = []
  for (const survey of ordered) {
    const summary = { survey: await describeSurvey(survey), ...(await summariseSurvey(survey, bands)) }
    entries.push({ summary, verdicts: target ? bandVerdicts(toMeasured(summary), target) : [] })
  }
  const before = toMeasured(entries[0]!.summary)
  const after = toMeasured(entries[entries.length - 1]!.summary)
  return {
    roomId: room.id,
    roomName: room.name,
    volumeM3,
    bandResolution: bands,
    target,
    surveys: entries,
    differences: differencesOf(before, after),
    summaryLine: target
      ? summarizeVerdictChange({ afterLabel: ordered[ordered.length - 1]!.name, before, after, mask: target, bandKind: bands === 'octave' ? 'octave' : 'third-octave' })
      : null,
  }
}
