import { DataTypes, type QueryInterface } from 'sequelize'

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('report_revisions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    room_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'rooms', key: 'id' }, onDelete: 'CASCADE' },
    /** 1, 2, 3 … per room. */
    number: { type: DataTypes.INTEGER, allowNull: false },
    survey_ids: { type: DataTypes.JSONB, allowNull: false },
    bands: { type: DataTypes.STRING(10), allowNull: false },
    /** What changed since the previous frozen revision (uploads, re-analyses, exclusions …). */
    change_notes: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    /** Null while the revision is a draft; set once, when it is sent or shared. */
    frozen_at: { type: DataTypes.DATE, allowNull: true },
    frozen_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    /** sha256 of the frozen inputs (captures used, analyses, target, verdicts): an unchanged send reuses the revision. */
    inputs_sha256: { type: DataTypes.STRING(64), allowNull: true },
    /** The frozen comparison, positions, profile and method notes the share link and e-mail show. */
    snapshot: { type: DataTypes.JSONB, allowNull: true },
    /** The PDF rendered at freezing time, served as it is forever after. */
    pdf: { type: DataTypes.BLOB, allowNull: true },
    /** [{ email, sentAt }] of every send of this revision. */
    recipients: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  })
  await qi.addIndex('report_revisions', ['room_id', 'number'], { unique: true })
  await qi.addColumn('share_links', 'report_revision_id', { type: DataTypes.INTEGER, allowNull: true, references: { model: 'report_revisions', key: 'id' }, onDelete: 'CASCADE' })
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('share_links', 'report_revision_id')
  await qi.dropTable('report_revisions', {})
}
