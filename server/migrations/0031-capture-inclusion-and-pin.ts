import { DataTypes, type QueryInterface } from 'sequelize'

export async function up(qi: QueryInterface): Promise<void> {
  // An excluded capture stays in its survey, visible and marked, but out of every average.
  await qi.addColumn('captures', 'excluded_at', { type: DataTypes.DATE, allowNull: true })
  await qi.addColumn('captures', 'exclusion_reason', { type: DataTypes.STRING(300), allowNull: true })
  await qi.addColumn('captures', 'excluded_by_id', { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' })
  // The analysis an owner or engineer chose for reporting; null = the default rule (the first
  // successful analysis with the survey's settings).
  await qi.addColumn('captures', 'pinned_analysis_id', { type: DataTypes.INTEGER, allowNull: true, references: { model: 'analyses', key: 'id' }, onDelete: 'SET NULL' })
  // The survey's analysis settings (bands, smoothing, gate, filtering); null = the engine defaults.
  await qi.addColumn('surveys', 'analysis_settings', { type: DataTypes.JSONB, allowNull: true })
  // What the consultant measured with, for the report's method notes.
  await qi.addColumn('surveys', 'equipment', { type: DataTypes.JSONB, allowNull: true })
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const column of ['pinned_analysis_id', 'excluded_by_id', 'exclusion_reason', 'excluded_at']) await qi.removeColumn('captures', column)
  for (const column of ['equipment', 'analysis_settings']) await qi.removeColumn('surveys', column)
}
