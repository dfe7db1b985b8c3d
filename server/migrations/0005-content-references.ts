import { DataTypes, type QueryInterface } from 'sequelize'

/**
 * Stored content is shared by sha256 across rows and columns (a capture's file, another capture's
 * reference sweep). Deleting a row — directly, or by cascade from its survey, room or workspace —
 * queues its sha256s in `content_releases` in the same transaction; the server then removes the
 * objects no row names any more (server/storage/releaseContent.ts). The trigger function is
 * generic: a table with its own content columns gets one CREATE TRIGGER naming them.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.addIndex('captures', ['sha256'])
  await qi.addIndex('captures', ['reference_sha256'])
  await qi.createTable('content_releases', {
    sha256: { type: DataTypes.STRING(64), primaryKey: true },
    queued_at: { type: DataTypes.DATE, allowNull: false, defaultValue: qi.sequelize.literal('now()') },
  })
  await qi.sequelize.query(`
    CREATE FUNCTION queue_content_release() RETURNS trigger LANGUAGE plpgsql AS $$
    DECLARE
      content_column text;
      old_sha256 text;
    BEGIN
      FOREACH content_column IN ARRAY TG_ARGV LOOP
        old_sha256 := to_jsonb(OLD) ->> content_column;
        IF old_sha256 IS NOT NULL AND (TG_OP = 'DELETE' OR old_sha256 IS DISTINCT FROM to_jsonb(NEW) ->> content_column) THEN
          INSERT INTO content_releases (sha256) VALUES (old_sha256) ON CONFLICT DO NOTHING;
        END IF;
      END LOOP;
      RETURN NULL;
    END
    $$`)
  await qi.sequelize.query(`
    CREATE TRIGGER captures_queue_content_release
    AFTER DELETE OR UPDATE OF sha256, reference_sha256 ON captures
    FOR EACH ROW EXECUTE FUNCTION queue_content_release('sha256', 'reference_sha256')`)
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query('DROP TRIGGER IF EXISTS captures_queue_content_release ON captures')
  await qi.sequelize.query('DROP FUNCTION IF EXISTS queue_content_release()')
  await qi.dropTable('content_releases', {})
  await qi.removeIndex('captures', ['reference_sha256'])
  await qi.removeIndex('captures', ['sha256'])
}
