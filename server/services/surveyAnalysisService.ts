import { Analysis, Capture } from '../models'
import { ForbiddenError } from '../errors'
import { mayOnRoom } from '../policy/policy'
import { requireSurveyAccess } from './surveysService'
import { requestReanalysis } from './reanalysisService'
import { recordActivity } from './activityService'
import { noteReportChange } from './reportDrafts'
import { surveyAnalysisSettings, surveySettingsKeyFor } from './countingAnalyses'
import { describeAnalysisSettings } from '../../shared/jobs/describeAnalysisSettings'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { SurveyAnalysisSettings } from '../../shared/api/surveys'
import type { SurveyAnalysisProgressDto, SurveyAnalysisRunDto } from '../../shared/api/results'

/**
 * "Analyse the whole survey with these settings": the settings become the survey's, and every
 * capture is queued through the same re-analysis service a single capture uses (each on its own
 * channel). Captures already analysed with them are left as they are. Pins stay as they were.
 */
export async function analyseWholeSurvey(userId: number, surveyId: number, settings: SurveyAnalysisSettings, queue: AnalysisQueue): Promise<SurveyAnalysisRunDto> {
  const { survey, room, role, isShared } = await requireSurveyAccess(userId, surveyId, 'room:read')
  if (!mayOnRoom(role, isShared, 'capture:judge')) throw new ForbiddenError('Only owners and engineers may start analyses.')
  await survey.update({ analysisSettings: settings })
  const captures = await Capture.findAll({ where: { surveyId }, attributes: ['id', 'channel'], order: [['id', 'ASC']] })
  let queued = 0
  for (const capture of captures) {
    const outcome = await requestReanalysis(userId, capture.id, { ...settings, channel: capture.channel }, queue, { quiet: true })
    if (outcome.isNewRun) queued++
  }
  const what = describeAnalysisSettings(settings)
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'survey.analysed', summary: `analysed the whole survey “${survey.name}” with ${what} (${queued} of ${captures.length} captures queued)` })
  await noteReportChange(room.id, surveyId, `Survey “${survey.name}” analysed with ${what}`)
  return { settings, queued, alreadyAnalysed: captures.length - queued, total: captures.length }
}

/** How many captures of the survey have an analysis with its settings, are still waiting, or failed. */
export async function surveyAnalysisProgress(userId: number, surveyId: number): Promise<SurveyAnalysisProgressDto> {
  const { survey } = await requireSurveyAccess(userId, surveyId, 'room:read')
  const settings = surveyAnalysisSettings(survey)
  const captures = await Capture.findAll({ where: { surveyId }, attributes: ['id', 'channel'] })
  // The job record of each capture's analysis with the survey's settings tells done, failed or pending.
  const rows = await Analysis.findAll({ where: { captureId: captures.map((c) => c.id) }, attributes: ['captureId', 'settingsKey', 'status'] })
  let done = 0
  let failed = 0
  for (const capture of captures) {
    const key = surveySettingsKeyFor(capture, settings)
    const row = rows.find((a) => a.captureId === capture.id && a.settingsKey === key)
    if (row?.status === 'done') done++
    else if (row?.status === 'failed') failed++
  }
  return { settings, total: captures.length, done, failed, pending: captures.length - done - failed }
}
