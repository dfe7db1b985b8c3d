import { DataTypes, type QueryInterface } from 'sequelize'

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('analyses', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    capture_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'captures', key: 'id' }, onDelete: 'CASCADE' },
    /** Canonical JSON of the AnalysisSettings: one analysis per capture and settings. */
    settings_key: { type: DataTypes.STRING(200), allowNull: false },
    engine_version: { type: DataTypes.STRING(40), allowNull: false },
    result: { type: DataTypes.JSONB, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  })
  await qi.addIndex('analyses', ['capture_id', 'settings_key'], { unique: true })
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('analyses')
}
