import { QueryTypes } from 'sequelize'
import { Analysis } from '../server/models'
import { headlineOf } from '../shared/jobs/analysisHeadline'
import { DEFAULT_ANALYSIS_SETTINGS, keyToSettings, settingsToKey } from '../shared/jobs/analysisSettingsKey'
import type { AnalysisJobPayload } from '../shared/jobs/analysisJob'
import type { AnalysisResult } from '../shared/types/analysis'

// The worker's writes to its job record: it touches only the analysis row its job names, and each
// write is conditional on the state it expects, so a duplicate or late delivery changes nothing.

const WITHOUT_RESULT = { exclude: ['result'] as string[] }

/**
 * The row a job is for. Jobs queued before analyses were job records carry only the capture and
 * settings; their row is found, or written as the server would have written it.
 */
export async function analysisIdOf(payload: AnalysisJobPayload, channel: () => Promise<number>): Promise<number> {
  if (payload.analysisId) return payload.analysisId
  const settingsKey = payload.settingsKey ?? settingsToKey({ ...DEFAULT_ANALYSIS_SETTINGS, channel: await channel() })
  const [analysis] = await Analysis.findOrCreate({
    where: { captureId: payload.captureId, settingsKey },
    defaults: { captureId: payload.captureId, settingsKey, settings: keyToSettings(settingsKey), status: 'queued', enqueuedAt: new Date() },
  })
  return analysis.id
}

/** Takes the row for this attempt (queued, or analysing after a stalled attempt); null when it is done, failed or gone. */
export async function claimAnalysis(analysisId: number): Promise<Analysis | null> {
  const claimed = await Analysis.sequelize!.query(
    `UPDATE analyses SET status = 'analysing', attempts = attempts + 1, started_at = now(), status_message = 'Reading the file', updated_at = now()
     WHERE id = :analysisId AND status IN ('queued', 'analysing') RETURNING id`,
    { type: QueryTypes.SELECT, replacements: { analysisId } },
  )
  if (claimed.length === 0) return null
  return Analysis.findByPk(analysisId, { attributes: WITHOUT_RESULT })
}

const whileAnalysing = (analysis: Analysis) => ({ where: { id: analysis.id, status: 'analysing' as const } })

export async function recordStage(analysis: Analysis, statusMessage: string): Promise<void> {
  await Analysis.update({ statusMessage }, whileAnalysing(analysis))
}

/** Stores the result once, with the headline figures the captures list shows. */
export async function recordResult(analysis: Analysis, result: AnalysisResult): Promise<void> {
  const headline = headlineOf(result)
  await Analysis.update(
    {
      status: 'done',
      result,
      engineVersion: result.engineVersion,
      headlineT30S: headline.T30S,
      headlineT20S: headline.T20S,
      headlineEDTS: headline.EDTS,
      headlineC80Db: headline.C80Db,
      finishedAt: new Date(),
      statusMessage: null,
      error: null,
    },
    whileAnalysing(analysis),
  )
}

/** A final failure ends the row `failed` with the message; otherwise it waits for BullMQ's retry. */
export async function recordFailure(analysis: Analysis, message: string, options: { isFinal: boolean }): Promise<void> {
  const change = options.isFinal
    ? { status: 'failed' as const, error: message, finishedAt: new Date(), statusMessage: null }
    : { status: 'queued' as const, statusMessage: `Trying again after a problem: ${message}`.slice(0, 200) }
  await Analysis.update(change, whileAnalysing(analysis))
}
