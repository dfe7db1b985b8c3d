import { Op } from 'sequelize'
import { Analysis, type Capture, type Survey } from '../models'
import { DEFAULT_ANALYSIS_SETTINGS, keyToSettings, settingsToKey } from '../../shared/jobs/analysisSettingsKey'
import type { SurveyAnalysisSettings } from '../../shared/api/surveys'
import type { BandResolution } from '../../shared/types/analysis'

/** A survey's analysis settings; a survey that never chose any uses the engine defaults. */
export function surveyAnalysisSettings(survey: Pick<Survey, 'analysisSettings'>): SurveyAnalysisSettings {
  const { bands, smoothing, gateMs, timeReversedFiltering } = { ...DEFAULT_ANALYSIS_SETTINGS, ...(survey.analysisSettings ?? {}) }
  return { bands, smoothing, gateMs, timeReversedFiltering }
}

/** The settings key a capture of the survey is analysed with at a band resolution. */
export function surveySettingsKeyFor(capture: Pick<Capture, 'channel'>, settings: SurveyAnalysisSettings, bands: BandResolution = settings.bands): string {
  return settingsToKey({ ...settings, bands, channel: capture.channel })
}

/**
 * THE rule for which analysis counts for a capture (capture page, captures list, survey average,
 * comparison, exports and report snapshots all call this):
 * 1. the analysis an owner or engineer pinned, when it has the band resolution asked for;
 * 2. else the first successful analysis with the survey's settings at that band resolution;
 * 3. else none: the capture is "not analysed" at that resolution.
 * Newer analyses never replace the one that counts by themselves. Results are loaded only for
 * the analyses chosen.
 */
export async function countingAnalyses(
  captures: readonly Pick<Capture, 'id' | 'channel' | 'pinnedAnalysisId'>[],
  survey: Pick<Survey, 'analysisSettings'>,
  bands?: BandResolution,
  options: { withResult?: boolean } = {},
): Promise<Map<number, Analysis>> {
  if (captures.length === 0) return new Map()
  const settings = surveyAnalysisSettings(survey)
  const wantedBands = bands ?? settings.bands
  // Only finished analyses count (an analysis row is also the job record of a queued or failed run).
  const candidates = await Analysis.findAll({
    where: { captureId: { [Op.in]: captures.map((c) => c.id) }, status: 'done' },
    attributes: ['id', 'captureId', 'settingsKey', 'createdAt'],
    order: [['createdAt', 'ASC'], ['id', 'ASC']],
  })
  const chosen = new Map<number, number>()
  for (const capture of captures) {
    const own = candidates.filter((a) => a.captureId === capture.id)
    const pinned = own.find((a) => a.id === capture.pinnedAnalysisId && keyToSettings(a.settingsKey).bands === wantedBands)
    const byDefault = own.find((a) => a.settingsKey === surveySettingsKeyFor(capture, settings, wantedBands))
    const analysis = pinned ?? byDefault
    if (analysis) chosen.set(capture.id, analysis.id)
  }
  if (chosen.size === 0) return new Map()
  const rows = await Analysis.findAll({
    where: { id: { [Op.in]: [...chosen.values()] } },
    ...(options.withResult === false ? { attributes: ['id', 'captureId', 'settingsKey', 'engineVersion', 'createdAt', 'updatedAt'] } : {}),
  })
  return new Map(rows.map((row) => [row.captureId, row]))
}
