import { Analysis } from '../models'
import { ForbiddenError, ValidationError } from '../errors'
import { mayOnRoom } from '../policy/policy'
import { requireCaptureAccess } from './capturesService'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisListItemDto } from '../../shared/api/results'
import type { AnalysisSettings } from '../../shared/types/analysis'
import { keyToSettings, settingsToKey } from '../../shared/jobs/analysisSettingsKey'
import { recordActivity } from './activityService'
import { countingAnalyses } from './countingAnalyses'
import { noteReportChange } from './reportDrafts'
import type { Survey } from '../models'

export async function listAnalyses(userId: number, captureId: number): Promise<AnalysisListItemDto[]> {
  const { capture } = await requireCaptureAccess(userId, captureId)
  const survey = (capture as typeof capture & { survey: Survey }).survey
  const counting = (await countingAnalyses([capture], survey, undefined, { withResult: false })).get(capture.id)
  const analyses = await Analysis.findAll({ where: { captureId }, attributes: ['id', 'settingsKey', 'engineVersion', 'createdAt'], order: [['createdAt', 'ASC']] })
  return analyses.map((a) => ({
    id: a.id,
    isCounting: a.id === counting?.id,
    isPinned: a.id === capture.pinnedAnalysisId,
    settings: keyToSettings(a.settingsKey),
    engineVersion: a.engineVersion,
    createdAt: a.createdAt.toISOString(),
  }))
}

/**
 * Queues an analysis with other settings; the earlier analyses stay and the one that counts for
 * reporting does not change (re-pinning is its own action). Settings already analysed are
 * answered as they are. Owners and engineers only. `quiet` leaves the activity line to a caller
 * that analyses many captures at once.
 */
export async function requestReanalysis(
  userId: number,
  captureId: number,
  settings: AnalysisSettings,
  queue: AnalysisQueue,
  options: { quiet?: boolean } = {},
): Promise<{ captureId: number; settingsKey: string; status: 'queued' | 'exists' }> {
  const { capture, room, role, isShared } = await requireCaptureAccess(userId, captureId)
  if (!mayOnRoom(role, isShared, 'capture:judge')) throw new ForbiddenError('Only owners and engineers may start analyses.')
  if (settings.channel >= capture.channelCount) {
    const message = `Channel ${settings.channel} does not exist: the file has ${capture.channelCount} channel(s), numbered from 0.`
    throw new ValidationError(message, { channel: message })
  }
  const settingsKey = settingsToKey(settings)
  if (await Analysis.findOne({ where: { captureId, settingsKey }, attributes: ['id'] })) return { captureId, settingsKey, status: 'exists' }
  await queue.enqueue({ captureId, settingsKey })
  await capture.update({ status: 'queued', statusMessage: 'Re-analysis waiting for a worker' })
  const what = `${settings.bands === 'octave' ? 'octave' : 'third-octave'} bands, 1/${settings.smoothing} octave smoothing`
  if (!options.quiet) {
    await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.reanalysed', summary: `re-analysed ${capture.originalName} (${what})` })
    await noteReportChange(room.id, capture.surveyId, `${capture.receiverLabel || capture.originalName} re-analysed (${what})`)
  }
  return { captureId, settingsKey, status: 'queued' }
}
