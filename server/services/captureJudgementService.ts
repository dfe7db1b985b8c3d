import { Analysis } from '../models'
import { ForbiddenError, ValidationError } from '../errors'
import { mayOnRoom } from '../policy/policy'
import { getCapture, requireCaptureAccess } from './capturesService'
import { recordActivity } from './activityService'
import { noteReportChange } from './reportDrafts'
import { describeAnalysisSettings } from '../../shared/jobs/describeAnalysisSettings'
import { keyToSettings } from '../../shared/jobs/analysisSettingsKey'
import type { CaptureDto, CaptureInclusionBody } from '../../shared/api/captures'
import type { Survey } from '../models'

async function requireJudge(userId: number, captureId: number, what: string) {
  const access = await requireCaptureAccess(userId, captureId)
  if (!mayOnRoom(access.role, access.isShared, 'capture:judge')) throw new ForbiddenError(`Only owners and engineers may ${what}.`)
  return access
}

/**
 * Includes a capture in its survey's average or leaves it out with a reason. An excluded capture
 * stays listed and marked; every average, verdict, export and new report revision leaves it out.
 */
export async function setCaptureInclusion(userId: number, captureId: number, body: CaptureInclusionBody): Promise<CaptureDto> {
  const { capture, room } = await requireJudge(userId, captureId, 'include or exclude positions')
  const survey = (capture as typeof capture & { survey: Survey }).survey
  const label = capture.receiverLabel || capture.originalName
  const isExcluded = capture.excludedAt !== null
  if (body.isIncluded === !isExcluded && (body.isIncluded || body.reason === capture.exclusionReason)) return getCapture(userId, captureId)
  if (body.isIncluded) {
    await capture.update({ excludedAt: null, exclusionReason: null, excludedById: null })
  } else {
    await capture.update({ excludedAt: new Date(), exclusionReason: body.reason, excludedById: userId })
  }
  const summary = body.isIncluded
    ? `included ${label} in the average of “${survey.name}” again`
    : `excluded ${label} from the average of “${survey.name}”: ${body.reason}`
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: body.isIncluded ? 'capture.included' : 'capture.excluded', summary })
  await noteReportChange(room.id, capture.surveyId, body.isIncluded ? `${label} included again` : `${label} excluded: ${body.reason}`)
  return getCapture(userId, captureId)
}

/** Pins the analysis that counts for the capture, or (null) goes back to the default rule. */
export async function pinAnalysis(userId: number, captureId: number, analysisId: number | null): Promise<CaptureDto> {
  const { capture, room } = await requireJudge(userId, captureId, 'choose the analysis used for reporting')
  const label = capture.receiverLabel || capture.originalName
  let what = 'the default analysis (the first with the survey’s settings)'
  if (analysisId !== null) {
    const analysis = await Analysis.findOne({ where: { id: analysisId, captureId }, attributes: ['id', 'settingsKey'] })
    if (!analysis) {
      const message = 'That analysis does not belong to this capture, or is not finished.'
      throw new ValidationError(message, { analysisId: message })
    }
    what = `the analysis with ${describeAnalysisSettings(keyToSettings(analysis.settingsKey))}`
  }
  if (capture.pinnedAnalysisId === analysisId) return getCapture(userId, captureId)
  await capture.update({ pinnedAnalysisId: analysisId })
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.pinned', summary: `chose ${what} for ${label}` })
  await noteReportChange(room.id, capture.surveyId, `${label}: ${what} chosen for reporting`)
  return getCapture(userId, captureId)
}
