import { Op, QueryTypes, type Transaction } from 'sequelize'
import { Analysis } from '../models'
import { analysisJobId, type AnalysisQueue } from '../queue/analysisQueue'
import { settingsToKey } from '../../shared/jobs/analysisSettingsKey'
import { ANALYSIS_JOB_ATTEMPTS } from '../../shared/jobs/analysisJob'
import type { AnalysisSettings } from '../../shared/types/analysis'
import { logger } from '../logger'

export interface AnalysisRequest {
  analysis: Analysis
  /** True when this call queued a run (a new row, or a failed row queued again). */
  isNewRun: boolean
}

/**
 * Writes the job record for one capture and settings, before anything goes to Redis. A new pair
 * gets a `queued` row; a `failed` row is queued again in place (same row, fresh queued time, so a
 * fresh job id); a `queued`, `analysing` or `done` row is answered as it is, so two requests with
 * the same settings give one row and one job, and a finished analysis is never redone.
 */
export async function recordAnalysisRequest(captureId: number, settings: AnalysisSettings, options: { transaction?: Transaction } = {}): Promise<AnalysisRequest> {
  const settingsKey = settingsToKey(settings)
  const sequelize = Analysis.sequelize!
  // queued_at comes from here (millisecond precision) so the job id derived from it round-trips.
  const rows = await sequelize.query<{ id: number }>(
    `INSERT INTO analyses (capture_id, settings_key, settings, status, attempts, queued_at, created_at, updated_at)
     VALUES (:captureId, :settingsKey, CAST(:settingsKey AS jsonb), 'queued', 0, :now, :now, :now)
     ON CONFLICT (capture_id, settings_key) DO UPDATE
       SET status = 'queued', queued_at = :now, enqueued_at = NULL, started_at = NULL, finished_at = NULL,
           error = NULL, status_message = NULL, attempts = 0, updated_at = :now
       WHERE analyses.status = 'failed'
     RETURNING id`,
    { type: QueryTypes.SELECT, replacements: { captureId, settingsKey, now: new Date() }, transaction: options.transaction },
  )
  const analysis = await Analysis.findOne({ where: { captureId, settingsKey }, attributes: { exclude: ['result'] }, transaction: options.transaction })
  if (!analysis) throw new Error(`analysis of capture ${captureId} vanished while it was queued`)
  return { analysis, isNewRun: rows.length > 0 }
}

/**
 * Hands a queued row to BullMQ and notes that it is there. When Redis does not answer the row
 * stays `queued` without `enqueuedAt` (the capture reads `uploaded`) and the queue pass retries.
 */
export async function dispatchAnalysis(analysis: Analysis, queue: AnalysisQueue): Promise<boolean> {
  try {
    await queue.enqueue({ analysisId: analysis.id, captureId: analysis.captureId }, analysisJobId(analysis))
  } catch (error) {
    logger.warn({ err: error, analysisId: analysis.id }, 'could not enqueue; the queue pass will retry')
    return false
  }
  const enqueuedAt = new Date()
  const [changed] = await Analysis.update({ enqueuedAt }, { where: { id: analysis.id, queuedAt: analysis.queuedAt, enqueuedAt: null } })
  if (changed > 0) analysis.enqueuedAt = enqueuedAt
  return true
}

const PASS_LIMIT = 100
/** A row not touched for this long while its job is gone has lost its worker's answer. */
const STRANDED_AFTER_MS = 120_000
const GONE_JOB_STATES = new Set(['unknown', 'completed', 'failed'])

/**
 * Sends every queued row that never reached Redis (accepted during an outage, converted by a
 * migration, or recovered below), so it is queued exactly once.
 */
export async function dispatchWaitingAnalyses(queue: AnalysisQueue): Promise<number> {
  const waiting = await Analysis.findAll({ where: { status: 'queued', enqueuedAt: null }, attributes: { exclude: ['result'] }, order: [['queuedAt', 'ASC']], limit: PASS_LIMIT })
  let dispatched = 0
  for (const analysis of waiting) if (await dispatchAnalysis(analysis, queue)) dispatched++
  return dispatched
}

/**
 * Finds rows still `queued` or `analysing` whose job BullMQ no longer runs (its worker lost the
 * database on the last attempt, or Redis lost the job): queued again while attempts remain, else
 * marked failed with a message, so no analysis waits forever.
 */
export async function recoverStrandedAnalyses(queue: AnalysisQueue, options: { strandedAfterMs?: number } = {}): Promise<number> {
  const before = new Date(Date.now() - (options.strandedAfterMs ?? STRANDED_AFTER_MS))
  const candidates = await Analysis.findAll({
    where: { status: ['queued', 'analysing'], enqueuedAt: { [Op.ne]: null }, updatedAt: { [Op.lt]: before } },
    attributes: ['id', 'captureId', 'status', 'attempts', 'queuedAt'],
    order: [['updatedAt', 'ASC']],
    limit: PASS_LIMIT,
  })
  let recovered = 0
  for (const analysis of candidates) {
    const state = await queue.jobState(analysisJobId(analysis)).catch(() => 'unreachable')
    if (!GONE_JOB_STATES.has(state)) continue
    const where = { id: analysis.id, queuedAt: analysis.queuedAt, status: ['queued', 'analysing'] as ('queued' | 'analysing')[] }
    const [changed] = analysis.attempts >= ANALYSIS_JOB_ATTEMPTS
      ? await Analysis.update({ status: 'failed', error: 'The analysis stopped without a result. Analyse the capture again.', finishedAt: new Date(), statusMessage: null }, { where })
      : await Analysis.update({ status: 'queued', queuedAt: new Date(), enqueuedAt: null, statusMessage: null }, { where })
    recovered += changed
  }
  return recovered
}

/** The server's periodic queue pass (every 10 s, on every server: each step is safe to race). */
export async function superviseAnalysisQueue(queue: AnalysisQueue): Promise<{ dispatched: number; recovered: number }> {
  const recovered = await recoverStrandedAnalyses(queue)
  const dispatched = await dispatchWaitingAnalyses(queue)
  return { dispatched, recovered }
}
