import { DataTypes, type QueryInterface } from 'sequelize'

const ROLES = ['owner', 'engineer', 'client', 'viewer']

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('api_tokens', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    workspace_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    /** The first characters of the secret, shown in lists so a person can tell tokens apart. */
    token_prefix: { type: DataTypes.STRING(16), allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    last_used_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    revoked_reason: { type: DataTypes.STRING(200), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  })
  await qi.addIndex('api_tokens', ['user_id'])
  await qi.addIndex('api_tokens', ['workspace_id', 'user_id'])
  // Activity rows written by a token request name that token (the audit trail of the token).
  await qi.addColumn('activities', 'api_token_id', {
    type: DataTypes.INTEGER,
    allowNull: true,
    references: { model: 'api_tokens', key: 'id' },
    onDelete: 'SET NULL',
  })
  await qi.addIndex('activities', ['api_token_id', 'created_at'])
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('activities', 'api_token_id')
  await qi.dropTable('api_tokens', {})
  await qi.sequelize.query('DROP TYPE IF EXISTS "enum_api_tokens_role"')
}
