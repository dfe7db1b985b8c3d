import { DataTypes, type QueryInterface } from 'sequelize'

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true }
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
}

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('password_resets', {
    id,
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  })
  await qi.createTable('share_links', {
    id,
    room_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'rooms', key: 'id' }, onDelete: 'CASCADE' },
    created_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    survey_ids: { type: DataTypes.JSONB, allowNull: false },
    bands: { type: DataTypes.STRING(10), allowNull: false },
    label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  })
  await qi.createTable('activities', {
    id,
    workspace_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    room_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'rooms', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    action: { type: DataTypes.STRING(60), allowNull: false },
    summary: { type: DataTypes.STRING(500), allowNull: false },
    ...timestamps,
  })
  await qi.addIndex('activities', ['room_id', 'created_at'])
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['activities', 'share_links', 'password_resets']) await qi.dropTable(table)
}
