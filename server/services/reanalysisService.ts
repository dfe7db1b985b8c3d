import { Analysis } from '../models'
import { ForbiddenError, ValidationError } from '../errors'
import { mayOnRoom } from '../policy/policy'
import { requireCaptureAccess } from './capturesService'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisListItemDto } from '../../shared/api/results'
import type { AnalysisSettings } from '../../shared/types/analysis'
import { keyToSettings, settingsToKey } from '../../shared/jobs/analysisSettingsKey'
import { recordActivity } from './activityService'

export async function listAnalyses(userId: number, captureId: number): Promise<AnalysisListItemDto[]> {
  await requireCaptureAccess(userId, captureId)
  const analyses = await Analysis.findAll({ where: { captureId }, attributes: ['id', 'settingsKey', 'engineVersion', 'createdAt'], order: [['createdAt', 'ASC']] })
  return analyses.map((a) => ({ id: a.id, settings: keyToSettings(a.settingsKey), engineVersion: a.engineVersion, createdAt: a.createdAt.toISOString() }))
}

/**
 * Queues an analysis with other settings; the earlier analyses stay. Settings already analysed
 * are queued again only when the capture is not done (a retry), else answered as they are.
 */
export async function requestReanalysis(userId: number, captureId: number, settings: AnalysisSettings, queue: AnalysisQueue): Promise<{ captureId: number; settingsKey: string; status: 'queued' | 'exists' }> {
  const { capture, room, role, isShared } = await requireCaptureAccess(userId, captureId)
  if (!mayOnRoom(role, isShared, 'capture:create')) throw new ForbiddenError('Your role may not start analyses.')
  if (settings.channel >= capture.channelCount) {
    const message = `Channel ${settings.channel} does not exist: the file has ${capture.channelCount} channel(s), numbered from 0.`
    throw new ValidationError(message, { channel: message })
  }
  const settingsKey = settingsToKey(settings)
  if (await Analysis.findOne({ where: { captureId, settingsKey }, attributes: ['id'] })) return { captureId, settingsKey, status: 'exists' }
  await queue.enqueue({ captureId, settingsKey })
  await capture.update({ status: 'queued', statusMessage: 'Re-analysis waiting for a worker' })
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.reanalysed', summary: `re-analysed ${capture.originalName} (${settings.bands} bands, 1/${settings.smoothing} octave smoothing)` })
  return { captureId, settingsKey, status: 'queued' }
}
