import { DataTypes, type QueryInterface } from 'sequelize'

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
}

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('custom_targets', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    workspace_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    /** Where the limits come from (a brief, a standard, a client requirement): required. */
    source_note: { type: DataTypes.STRING(500), allowNull: false },
    /** [{ centreHz, minS, maxS }] per octave 63 Hz–8 kHz. */
    octave_limits: { type: DataTypes.JSONB, allowNull: false },
    created_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  })
  await qi.addIndex('custom_targets', ['workspace_id'])
  await qi.createTable('workspace_profiles', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    workspace_id: { type: DataTypes.INTEGER, allowNull: false, unique: true, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    consultancy_name: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    address: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    contact: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    logo: { type: DataTypes.BLOB, allowNull: true },
    logo_content_type: { type: DataTypes.STRING(20), allowNull: true },
    ...timestamps,
  })
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('workspace_profiles', {})
  await qi.dropTable('custom_targets', {})
}
