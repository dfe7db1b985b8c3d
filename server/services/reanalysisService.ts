import { Analysis } from '../models'
import { ForbiddenError, ValidationError } from '../errors'
import { mayOnRoom } from '../policy/policy'
import { requireCaptureAccess } from './capturesService'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisListItemDto, ReanalysisDto } from '../../shared/api/results'
import type { AnalysisSettings } from '../../shared/types/analysis'
import { recordActivity } from './activityService'
import { dispatchAnalysis, recordAnalysisRequest } from './analysisJobsService'

/** Every analysis of a capture (done, under way or failed) without results, oldest first. */
export async function listAnalyses(userId: number, captureId: number): Promise<AnalysisListItemDto[]> {
  await requireCaptureAccess(userId, captureId)
  const analyses = await Analysis.findAll({ where: { captureId }, attributes: { exclude: ['result'] }, order: [['createdAt', 'ASC'], ['id', 'ASC']] })
  return analyses.map((a) => ({
    id: a.id,
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
 * Asks for an analysis with these settings; the capture's other analyses, and its state, stay as
 * they are. New settings add a row; settings that failed before run again in the same row;
 * settings done or under way are answered as they are (one row, one job).
 */
export async function requestReanalysis(userId: number, captureId: number, settings: AnalysisSettings, queue: AnalysisQueue): Promise<ReanalysisDto> {
  const { capture, room, role, isShared } = await requireCaptureAccess(userId, captureId)
  if (!mayOnRoom(role, isShared, 'capture:create')) throw new ForbiddenError('Your role may not start analyses.')
  if (settings.channel >= capture.channelCount) {
    const message = `Channel ${settings.channel} does not exist: the file has ${capture.channelCount} channel(s), numbered from 0.`
    throw new ValidationError(message, { channel: message })
  }
  const { analysis, isNewRun } = await recordAnalysisRequest(captureId, settings)
  if (isNewRun) {
    await dispatchAnalysis(analysis, queue)
    await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.reanalysed', summary: `re-analysed ${capture.originalName} (${settings.bands} bands, 1/${settings.smoothing} octave smoothing)` })
  }
  return { captureId, analysisId: analysis.id, settingsKey: analysis.settingsKey, status: analysis.status, isNewRun }
}
