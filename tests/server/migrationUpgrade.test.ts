import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { QueryTypes, type Sequelize } from 'sequelize'
import { Queue } from 'bullmq'
import { Redis } from 'ioredis'
import { createSequelize } from '../../server/db/createSequelize'
import { createMigrator } from '../../server/db/createMigrator'
import { initModels } from '../../server/models'
import { createAnalysisQueue } from '../../server/queue/analysisQueue'
import { dispatchWaitingAnalyses } from '../../server/services/analysisJobsService'
import { loadCaptureViews } from '../../server/services/captureStates'
import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '../../shared/acoustics/analyseCapture'
import { synthesizeRoomImpulse } from '../../shared/acoustics/synthetic/synthesizeRoomImpulse'
import { headlineOf } from '../../shared/jobs/analysisHeadline'
import { ANALYSIS_QUEUE_NAME } from '../../shared/jobs/analysisJob'
import { settingsToKey } from '../../shared/jobs/analysisSettingsKey'
import type { AnalysisResult, AnalysisSettings } from '../../shared/types/analysis'
import { requireServiceUrls } from '../helpers/testServices'

// A database as the previous version left it (migrations 0001–0004, captures in every status,
// analyses with real engine results), upgraded to the job-record schema and back.

const PREVIOUS_VERSION = '0004-invitations-shares-activity'
let sequelize: Sequelize
let redis: Redis
const config = requireServiceUrls()

const sql = <T extends object>(query: string, replacements: Record<string, unknown> = {}) => sequelize.query<T>(query, { type: QueryTypes.SELECT, replacements })

function resultFor(t60S: number, settings: AnalysisSettings, seed: number): AnalysisResult {
  const impulse = synthesizeRoomImpulse({
    sampleRateHz: 48_000,
    durationS: 1.5,
    bandDecays: [63, 125, 250, 500, 1000, 2000, 4000, 8000].map((centreHz) => ({ centreHz, T60S: t60S })),
    noiseFloorDb: -90,
    seed,
  })
  return analyseCapture(impulse, { sampleRateHz: 48_000, kind: 'impulse', settings })
}

type LegacyStatus = 'uploaded' | 'queued' | 'analysing' | 'done' | 'failed'

async function insertCapture(surveyId: number, label: string, status: LegacyStatus, statusMessage: string | null): Promise<number> {
  const [row] = await sql<{ id: number }>(
    `INSERT INTO captures (survey_id, kind, receiver_label, original_name, sha256, byte_size, sample_rate_hz, bit_depth, channel_count, duration_s, status, status_message, created_at, updated_at)
     VALUES (:surveyId, 'impulse', :label, :name, :sha, 1000, 48000, 24, 1, 1.5, :status, :statusMessage, now(), now()) RETURNING id`,
    { surveyId, label, name: `${label}.wav`, sha: label.padEnd(64, '0').slice(0, 64), status, statusMessage },
  )
  return row!.id
}

async function insertLegacyAnalysis(captureId: number, settings: AnalysisSettings, result: AnalysisResult): Promise<void> {
  await sql(
    `INSERT INTO analyses (capture_id, settings_key, engine_version, result, created_at, updated_at) VALUES (:captureId, :key, :engine, CAST(:result AS jsonb), now(), now()) RETURNING id`,
    { captureId, key: settingsToKey(settings), engine: result.engineVersion, result: JSON.stringify(result) },
  )
}

const octave = DEFAULT_ANALYSIS_SETTINGS
const third: AnalysisSettings = { ...DEFAULT_ANALYSIS_SETTINGS, bands: 'third', smoothing: 3 }
const captures: Record<string, number> = {}
let resultsBefore: { id: number; result: string }[] = []

beforeAll(async () => {
  sequelize = createSequelize(config.DATABASE_URL)
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;')
  await createMigrator(sequelize).up({ to: PREVIOUS_VERSION })
  redis = new Redis(config.REDIS_URL, { maxRetriesPerRequest: null })
  await redis.flushdb()

  const [workspace] = await sql<{ id: number }>(`INSERT INTO workspaces (name, created_at, updated_at) VALUES ('Upgrade test', now(), now()) RETURNING id`)
  const [room] = await sql<{ id: number }>(`INSERT INTO rooms (workspace_id, name, use, created_at, updated_at) VALUES (:id, 'Old room', 'control-room', now(), now()) RETURNING id`, { id: workspace!.id })
  const [survey] = await sql<{ id: number }>(`INSERT INTO surveys (room_id, name, measured_on, created_at, updated_at) VALUES (:id, 'Bare room', '2026-01-10', now(), now()) RETURNING id`, { id: room!.id })
  captures.analysed = await insertCapture(survey!.id, 'analysed', 'done', null)
  await insertLegacyAnalysis(captures.analysed, octave, resultFor(0.5, octave, 1))
  await insertLegacyAnalysis(captures.analysed, third, resultFor(0.5, third, 1))
  captures.failedReanalysis = await insertCapture(survey!.id, 'failed-reanalysis', 'failed', 'The worker ran out of memory.')
  await insertLegacyAnalysis(captures.failedReanalysis, octave, resultFor(0.3, octave, 2))
  captures.failed = await insertCapture(survey!.id, 'failed', 'failed', 'The file has no audio data.')
  captures.uploaded = await insertCapture(survey!.id, 'uploaded', 'uploaded', 'Waiting for the queue')
  captures.queued = await insertCapture(survey!.id, 'queued', 'queued', 'Waiting for a worker')
  captures.analysing = await insertCapture(survey!.id, 'analysing', 'analysing', 'Analysing bands')
  resultsBefore = await sql<{ id: number; result: string }>(`SELECT id, result::text AS result FROM analyses ORDER BY id`)

  await createMigrator(sequelize).up()
  initModels(sequelize)
}, 120_000)
afterAll(async () => {
  await redis?.quit()
  await sequelize?.close()
})

describe('upgrading a database of the previous version', () => {
  it('keeps every analysis with its result, now a done row with JSONB settings and headline columns', async () => {
    const after = await sql<{ id: number; result: string; status: string; settings: AnalysisSettings; settings_key: string; headline_t30_s: number | null; headline_c80_db: number | null }>(
      `SELECT id, result::text AS result, status, settings, settings_key, headline_t30_s, headline_c80_db FROM analyses WHERE result IS NOT NULL ORDER BY id`,
    )
    expect(after.map((row) => row.id)).toEqual(resultsBefore.map((row) => row.id))
    for (const [index, row] of after.entries()) {
      expect(row.result).toBe(resultsBefore[index]!.result)
      expect(row.status).toBe('done')
      expect(row.settings).toEqual(JSON.parse(row.settings_key))
      const headline = headlineOf(JSON.parse(row.result) as AnalysisResult)
      expect(row.headline_t30_s).toBeCloseTo(headline.T30S!, 10)
      expect(row.headline_c80_db).toBeCloseTo(headline.C80Db!, 10)
    }
  })

  it('keeps the capture states: failed and waiting captures without analyses stay so, analysed ones are done', async () => {
    const views = await loadCaptureViews(Object.values(captures).map((id) => ({ id })))
    const state = (name: string) => views.get(captures[name]!)!.state
    expect(state('analysed')).toMatchObject({ status: 'done', statusMessage: null })
    // The old schema kept no trace of a failed re-analysis' settings; the capture's results stand.
    expect(state('failedReanalysis')).toMatchObject({ status: 'done' })
    expect(state('failed')).toEqual({ status: 'failed', statusMessage: 'The file has no audio data.', shownAnalysisId: null })
    for (const name of ['uploaded', 'queued', 'analysing']) expect(state(name)).toMatchObject({ status: 'uploaded', statusMessage: 'Waiting for the queue' })
    const columns = await sql<{ column_name: string }>(`SELECT column_name FROM information_schema.columns WHERE table_name = 'captures' AND column_name LIKE 'status%'`)
    expect(columns).toEqual([])
  })

  it('sends the waiting captures to the queue once, with the default settings on their channel', async () => {
    const queue = createAnalysisQueue(redis, { prefix: config.QUEUE_PREFIX })
    expect(await dispatchWaitingAnalyses(queue)).toBe(3)
    expect(await dispatchWaitingAnalyses(queue)).toBe(0)
    const inspector = new Queue(ANALYSIS_QUEUE_NAME, { connection: redis, prefix: config.QUEUE_PREFIX })
    const jobs = await inspector.getJobs(['waiting'])
    expect(jobs.map((job) => job.data.captureId).sort()).toEqual([captures.uploaded, captures.queued, captures.analysing].sort())
    const waiting = await sql<{ settings_key: string }>(`SELECT settings_key FROM analyses WHERE capture_id = :id`, { id: captures.uploaded })
    expect(waiting.map((row) => row.settings_key)).toEqual([settingsToKey({ ...DEFAULT_ANALYSIS_SETTINGS, channel: 0 })])
    await Promise.all([inspector.obliterate({ force: true }), queue.close()])
    await inspector.close()
  })

  it('goes back down to the previous version and up again without losing a result', async () => {
    const migrator = createMigrator(sequelize)
    await migrator.down({ to: '0010-analysis-job-record' })
    const down = await sql<{ id: number; result: string }>(`SELECT id, result::text AS result FROM analyses ORDER BY id`)
    expect(down).toEqual(resultsBefore)
    const [failed] = await sql<{ status: string; status_message: string }>(`SELECT status, status_message FROM captures WHERE id = :id`, { id: captures.failed })
    expect(failed).toEqual({ status: 'failed', status_message: 'The file has no audio data.' })
    await migrator.up()
    const up = await sql<{ id: number; result: string }>(`SELECT id, result::text AS result FROM analyses WHERE status = 'done' ORDER BY id`)
    expect(up).toEqual(resultsBefore)
  })
})
