import { DataTypes, type QueryInterface } from 'sequelize'

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('room_models', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    room_id: { type: DataTypes.INTEGER, allowNull: false, unique: true, references: { model: 'rooms', key: 'id' }, onDelete: 'CASCADE' },
    layout: { type: DataTypes.JSONB, allowNull: true },
    treatment: { type: DataTypes.JSONB, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  })
  await qi.createTable('custom_materials', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    workspace_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    kind: { type: DataTypes.ENUM('surface', 'object'), allowNull: false },
    coefficients: { type: DataTypes.JSONB, allowNull: false },
    source: { type: DataTypes.STRING(300), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  })
  await qi.addIndex('custom_materials', ['workspace_id'])
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('custom_materials')
  await qi.dropTable('room_models')
  await qi.sequelize.query('DROP TYPE IF EXISTS "enum_custom_materials_kind"')
}
