import type { QueryInterface } from 'sequelize'
import { ANALYSIS_CHANGES_CHANNEL } from '../events/analysisChange'

/**
 * Every change of an analysis's state, and every deleted capture, is announced with
 * pg_notify('ringdown_analysis_changes', …) by the database itself, so whoever writes the row (a
 * server enqueueing, a worker on any machine, a migration) feeds the servers' live status streams.
 * PostgreSQL delivers a notification only when its transaction commits, so a listener that reads
 * the database on receipt sees the change. Payloads stay far below NOTIFY's 8000-byte limit: the
 * error text is cut to 500 characters.
 */

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction })
    await run(`
      CREATE FUNCTION ringdown_notify_analysis_change() RETURNS trigger AS $$
      BEGIN
        PERFORM pg_notify('${ANALYSIS_CHANGES_CHANNEL}', json_build_object(
          'kind', 'analysis',
          'analysisId', NEW.id,
          'captureId', NEW.capture_id,
          'surveyId', (SELECT survey_id FROM captures WHERE id = NEW.capture_id),
          'status', NEW.status,
          'statusMessage', left(NEW.status_message, 200),
          'error', left(NEW.error, 500),
          'queuedAt', NEW.queued_at,
          'enqueuedAt', NEW.enqueued_at,
          'finishedAt', NEW.finished_at,
          'headline', json_build_object('T30S', NEW.headline_t30_s, 'T20S', NEW.headline_t20_s, 'EDTS', NEW.headline_edt_s, 'C80Db', NEW.headline_c80_db)
        )::text);
        RETURN NULL;
      END
      $$ LANGUAGE plpgsql`)
    await run(`CREATE TRIGGER analyses_notify_insert AFTER INSERT ON analyses FOR EACH ROW EXECUTE FUNCTION ringdown_notify_analysis_change()`)
    await run(`
      CREATE TRIGGER analyses_notify_update AFTER UPDATE ON analyses FOR EACH ROW
      WHEN (OLD.status IS DISTINCT FROM NEW.status OR OLD.status_message IS DISTINCT FROM NEW.status_message
            OR OLD.enqueued_at IS DISTINCT FROM NEW.enqueued_at OR OLD.queued_at IS DISTINCT FROM NEW.queued_at)
      EXECUTE FUNCTION ringdown_notify_analysis_change()`)
    await run(`
      CREATE FUNCTION ringdown_notify_capture_deleted() RETURNS trigger AS $$
      BEGIN
        PERFORM pg_notify('${ANALYSIS_CHANGES_CHANNEL}', json_build_object('kind', 'capture-deleted', 'captureId', OLD.id, 'surveyId', OLD.survey_id)::text);
        RETURN NULL;
      END
      $$ LANGUAGE plpgsql`)
    await run(`CREATE TRIGGER captures_notify_delete AFTER DELETE ON captures FOR EACH ROW EXECUTE FUNCTION ringdown_notify_capture_deleted()`)
  })
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    DROP TRIGGER IF EXISTS captures_notify_delete ON captures;
    DROP TRIGGER IF EXISTS analyses_notify_update ON analyses;
    DROP TRIGGER IF EXISTS analyses_notify_insert ON analyses;
    DROP FUNCTION IF EXISTS ringdown_notify_capture_deleted();
    DROP FUNCTION IF EXISTS ringdown_notify_analysis_change();`)
}
