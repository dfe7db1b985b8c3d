import { DataTypes, type QueryInterface } from 'sequelize'

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true }
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
}
const reference = (table: string, onDelete: 'CASCADE' | 'SET NULL' = 'CASCADE', allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
})
const ROLE = DataTypes.ENUM('owner', 'engineer', 'client', 'viewer')

export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('users', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    ...timestamps,
  })
  await qi.createTable('workspaces', {
    id,
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...timestamps,
  })
  await qi.createTable('memberships', {
    id,
    workspace_id: reference('workspaces'),
    user_id: reference('users'),
    role: { type: ROLE, allowNull: false },
    ...timestamps,
  })
  await qi.addIndex('memberships', ['workspace_id', 'user_id'], { unique: true })
  await qi.createTable('rooms', {
    id,
    workspace_id: reference('workspaces'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    client_name: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    address: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    use: {
      type: DataTypes.ENUM('control-room', 'mixing-room', 'home-theatre', 'rehearsal-room', 'classroom', 'other'),
      allowNull: false,
    },
    length_m: { type: DataTypes.DOUBLE, allowNull: true },
    width_m: { type: DataTypes.DOUBLE, allowNull: true },
    height_m: { type: DataTypes.DOUBLE, allowNull: true },
    volume_m3: { type: DataTypes.DOUBLE, allowNull: true },
    target_profile: { type: DataTypes.STRING(60), allowNull: false, defaultValue: 'auto' },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...timestamps,
  })
  await qi.addIndex('rooms', ['workspace_id'])
  await qi.createTable('room_shares', {
    id,
    room_id: reference('rooms'),
    user_id: reference('users'),
    ...timestamps,
  })
  await qi.addIndex('room_shares', ['room_id', 'user_id'], { unique: true })
  await qi.createTable('invitations', {
    id,
    workspace_id: reference('workspaces'),
    room_id: reference('rooms', 'CASCADE', true),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: ROLE, allowNull: false },
    /** sha256 of the single-use token; the token itself is only in the e-mail. */
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    invited_by_id: reference('users', 'SET NULL', true),
    ...timestamps,
  })
  await qi.createTable('surveys', {
    id,
    room_id: reference('rooms'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    measured_on: { type: DataTypes.DATEONLY, allowNull: false },
    temperature_c: { type: DataTypes.DOUBLE, allowNull: true },
    humidity_percent: { type: DataTypes.DOUBLE, allowNull: true },
    treatment_description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    ...timestamps,
  })
  await qi.addIndex('surveys', ['room_id'])
  await qi.createTable('captures', {
    id,
    survey_id: reference('surveys'),
    uploaded_by_id: reference('users', 'SET NULL', true),
    kind: { type: DataTypes.ENUM('impulse', 'sweep'), allowNull: false },
    channel: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    source_label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    receiver_label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    position_x_m: { type: DataTypes.DOUBLE, allowNull: true },
    position_y_m: { type: DataTypes.DOUBLE, allowNull: true },
    position_z_m: { type: DataTypes.DOUBLE, allowNull: true },
    sweep_f1_hz: { type: DataTypes.DOUBLE, allowNull: true },
    sweep_f2_hz: { type: DataTypes.DOUBLE, allowNull: true },
    sweep_duration_s: { type: DataTypes.DOUBLE, allowNull: true },
    reference_sha256: { type: DataTypes.STRING(64), allowNull: true },
    original_name: { type: DataTypes.STRING(255), allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    byte_size: { type: DataTypes.BIGINT, allowNull: false },
    sample_rate_hz: { type: DataTypes.INTEGER, allowNull: false },
    bit_depth: { type: DataTypes.INTEGER, allowNull: false },
    channel_count: { type: DataTypes.INTEGER, allowNull: false },
    duration_s: { type: DataTypes.DOUBLE, allowNull: false },
    status: {
      type: DataTypes.ENUM('uploaded', 'queued', 'analysing', 'done', 'failed'),
      allowNull: false,
      defaultValue: 'uploaded',
    },
    status_message: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  })
  await qi.addIndex('captures', ['survey_id'])
  // The table connect-pg-simple expects (its documented schema).
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING, primaryKey: true },
    sess: { type: DataTypes.JSON, allowNull: false },
    expire: { type: DataTypes.DATE(6), allowNull: false },
  })
  await qi.addIndex('sessions', ['expire'])
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['sessions', 'captures', 'surveys', 'invitations', 'room_shares', 'rooms', 'memberships', 'workspaces', 'users']) {
    await qi.dropTable(table, { cascade: true })
  }
  for (const type of ['enum_memberships_role', 'enum_invitations_role', 'enum_rooms_use', 'enum_captures_kind', 'enum_captures_status']) {
    await qi.sequelize.query(`DROP TYPE IF EXISTS "${type}"`)
  }
}
