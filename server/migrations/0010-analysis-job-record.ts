import type { QueryInterface, Transaction } from 'sequelize'
import { DEFAULT_ANALYSIS_SETTINGS, settingsToKey } from '../../shared/jobs/analysisSettingsKey'

/**
 * The analysis row becomes the job record: status, settings as JSONB, a nullable result, error,
 * attempts and timestamps. The capture's own status goes: it is derived from its analyses from
 * now on. Nothing is lost on the way:
 * - every existing analysis (it has a result) becomes a `done` row with its result untouched;
 * - a capture that was not done and has no analysis for its default settings gets one: a `failed`
 *   row carrying its message, or a `queued` row not yet in Redis (shown as `uploaded`) that the
 *   server's queue pass then sends to the new queue;
 * - a failed re-analysis of a capture that also has results left no trace of its settings, so such
 *   a capture is `done` (the rule of issue 13: a failed re-analysis does not fail the capture).
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction })
    await run(`CREATE TYPE "enum_analyses_status" AS ENUM ('queued', 'analysing', 'done', 'failed')`)
    await run(`
      ALTER TABLE analyses
        ADD COLUMN status "enum_analyses_status" NOT NULL DEFAULT 'done',
        ADD COLUMN settings JSONB,
        ADD COLUMN status_message TEXT,
        ADD COLUMN error TEXT,
        ADD COLUMN attempts INTEGER NOT NULL DEFAULT 0,
        ADD COLUMN queued_at TIMESTAMPTZ,
        ADD COLUMN enqueued_at TIMESTAMPTZ,
        ADD COLUMN started_at TIMESTAMPTZ,
        ADD COLUMN finished_at TIMESTAMPTZ,
        ALTER COLUMN result DROP NOT NULL,
        ALTER COLUMN engine_version DROP NOT NULL`)
    await run(`UPDATE analyses SET settings = settings_key::jsonb, attempts = 1, queued_at = created_at, enqueued_at = created_at, started_at = created_at, finished_at = updated_at`)
    await run(`
      ALTER TABLE analyses
        ALTER COLUMN status SET DEFAULT 'queued',
        ALTER COLUMN settings SET NOT NULL,
        ALTER COLUMN queued_at SET NOT NULL,
        ALTER COLUMN queued_at SET DEFAULT now(),
        ADD CONSTRAINT analyses_done_has_result CHECK (status <> 'done' OR result IS NOT NULL)`)
    await convertCaptureStatuses(qi, transaction)
    await run(`ALTER TABLE captures DROP COLUMN status, DROP COLUMN status_message`)
    await run(`DROP TYPE IF EXISTS "enum_captures_status"`)
    // Survey queries select by settings (`settings @> '{"bands":"third"}'`), not LIKE on a string.
    await run(`CREATE INDEX analyses_settings ON analyses USING GIN (settings jsonb_path_ops)`)
    // The server's queue pass looks only at unfinished rows.
    await run(`CREATE INDEX analyses_unfinished ON analyses (queued_at) WHERE status IN ('queued', 'analysing')`)
  })
}

interface LegacyCapture {
  id: number
  channel: number
  status: 'uploaded' | 'queued' | 'analysing' | 'done' | 'failed'
  status_message: string | null
  updated_at: Date
}

async function convertCaptureStatuses(qi: QueryInterface, transaction: Transaction): Promise<void> {
  const [captures] = (await qi.sequelize.query(
    `SELECT c.id, c.channel, c.status, c.status_message, c.updated_at FROM captures c
      WHERE NOT EXISTS (SELECT 1 FROM analyses a WHERE a.capture_id = c.id AND a.status = 'done')`,
    { transaction },
  )) as [LegacyCapture[], unknown]
  for (const capture of captures) {
    const settings = { ...DEFAULT_ANALYSIS_SETTINGS, channel: capture.channel }
    const isFailed = capture.status === 'failed'
    await qi.sequelize.query(
      `INSERT INTO analyses (capture_id, settings_key, settings, status, error, attempts, queued_at, finished_at, created_at, updated_at)
       VALUES (:captureId, :settingsKey, CAST(:settingsKey AS jsonb), :status, :error, :attempts, :at, :finishedAt, :at, :at)
       ON CONFLICT (capture_id, settings_key) DO NOTHING`,
      {
        transaction,
        replacements: {
          captureId: capture.id,
          settingsKey: settingsToKey(settings),
          status: isFailed ? 'failed' : 'queued',
          error: isFailed ? (capture.status_message ?? 'The analysis failed.') : null,
          attempts: isFailed ? 1 : 0,
          at: capture.updated_at,
          finishedAt: isFailed ? capture.updated_at : null,
        },
      },
    )
  }
}

/** Back to a capture status column; rows without a result (queued or failed) cannot go back and are dropped. */
export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction })
    await run(`CREATE TYPE "enum_captures_status" AS ENUM ('uploaded', 'queued', 'analysing', 'done', 'failed')`)
    await run(`ALTER TABLE captures ADD COLUMN status "enum_captures_status" NOT NULL DEFAULT 'uploaded', ADD COLUMN status_message TEXT`)
    await run(`
      UPDATE captures c SET
        status = CASE
          WHEN EXISTS (SELECT 1 FROM analyses a WHERE a.capture_id = c.id AND a.status = 'done') THEN 'done'
          WHEN EXISTS (SELECT 1 FROM analyses a WHERE a.capture_id = c.id AND a.status = 'failed') THEN 'failed'
          ELSE 'uploaded' END::"enum_captures_status",
        status_message = (SELECT a.error FROM analyses a WHERE a.capture_id = c.id AND a.status = 'failed' ORDER BY a.queued_at DESC LIMIT 1)`)
    await run(`DELETE FROM analyses WHERE status <> 'done'`)
    await run(`DROP INDEX IF EXISTS analyses_settings`)
    await run(`DROP INDEX IF EXISTS analyses_unfinished`)
    await run(`
      ALTER TABLE analyses
        DROP CONSTRAINT analyses_done_has_result,
        DROP COLUMN status, DROP COLUMN settings, DROP COLUMN status_message, DROP COLUMN error, DROP COLUMN attempts,
        DROP COLUMN queued_at, DROP COLUMN enqueued_at, DROP COLUMN started_at, DROP COLUMN finished_at,
        ALTER COLUMN result SET NOT NULL,
        ALTER COLUMN engine_version SET NOT NULL`)
    await run(`DROP TYPE "enum_analyses_status"`)
  })
}
