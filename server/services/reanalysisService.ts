import { Analysis } from '../models'
import { ForbiddenError, ValidationError } from '../errors'
import { mayOnRoom } from '../policy/policy'
import { requireCaptureAccess } from './capturesService'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisListItemDto, ReanalysisDto } from '../../shared/api/results'
import type { AnalysisSettings } from '../../shared/types/analysis'
import { recordActivity } from './activityService'
import { countingAnalyses } from './countingAnalyses'
import { noteReportChange } from './reportDrafts'
import type { Survey } from '../models'
import { dispatchAnalysis, recordAnalysisRequest } from './analysisJobsService'

/** Every analysis of a capture (done, under way or failed) without results, oldest first. */
export async function listAnalyses(userId: number, captureId: number): Promise<AnalysisListItemDto[]> {
  const { capture } = await requireCaptureAccess(userId, captureId)
  const survey = (capture as typeof capture & { survey: Survey }).survey
  const counting = (await countingAnalyses([capture], survey, undefined, { withResult: false })).get(capture.id)
  const analyses = await Analysis.findAll({ where: { captureId }, attributes: { exclude: ['result'] }, order: [['createdAt', 'ASC'], ['id', 'ASC']] })
  return analyses.map((a) => ({
    id: a.id,
    isCounting: a.id === counting?.id && a.status === 'done',
    isPinned: a.id === capture.pinnedAnalysisId,
    settings: a.settings,
    status: a.status,
    statusMessage: a.statusMessage,
    error: a.error,
    attempts: a.attempts,
    engineVersion: a.engineVersion,
    createdAt: a.createdAt.toISOString(),
    queuedAt: a.queuedAt.toISOString(),
    finishedAt: a.finishedAt?.toISOString() ?? null,
  }))
}

/**
 * Asks for an analysis with these settings; the capture's other analyses, its state and the
 * analysis that counts for reporting stay as they are (re-pinning is its own action). New settings
 * add a row; settings that failed before run again in the same row; settings done or under way
 * are answered as they are (one row, one job). Owners and engineers only. `quiet` leaves the
 * activity line to a caller that analyses many captures at once.
 */
export async function requestReanalysis(
  userId: number,
  captureId: number,
  settings: AnalysisSettings,
  queue: AnalysisQueue,
  options: { quiet?: boolean } = {},
): Promise<ReanalysisDto> {
  const { capture, room, role, isShared } = await requireCaptureAccess(userId, captureId)
  if (!mayOnRoom(role, isShared, 'capture:judge')) throw new ForbiddenError('Only owners and engineers may start analyses.')
  if (settings.channel >= capture.channelCount) {
    const message = `Channel ${settings.channel} does not exist: the file has ${capture.channelCount} channel(s), numbered from 0.`
    throw new ValidationError(message, { channel: message })
  }
  const { analysis, isNewRun } = await recordAnalysisRequest(captureId, settings)
  if (isNewRun) {
    await dispatchAnalysis(analysis, queue)
    const what = `${settings.bands === 'octave' ? 'octave' : 'third-octave'} bands, 1/${settings.smoothing} octave smoothing`
    if (!options.quiet) {
      await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.reanalysed', summary: `re-analysed ${capture.originalName} (${what})` })
      await noteReportChange(room.id, capture.surveyId, `${capture.receiverLabel || capture.originalName} re-analysed (${what})`)
    }
  }
  return { captureId, analysisId: analysis.id, settingsKey: analysis.settingsKey, status: analysis.status, isNewRun }
}
