import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize'
import { ROLES, type Role } from '../../shared/api/common'
import type { Workspace } from './Workspace'

/** A personal API token: one user, one workspace, a role no higher than the user's; only its sha256 is kept. */
export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
  declare id: CreationOptional<number>
  declare userId: number
  declare workspaceId: number
  declare name: string
  declare role: Role
  declare tokenHash: string
  declare tokenPrefix: string
  declare expiresAt: Date
  declare lastUsedAt: CreationOptional<Date | null>
  declare revokedAt: CreationOptional<Date | null>
  declare revokedReason: CreationOptional<string | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>
  declare workspace?: NonAttribute<Workspace>

  static initModel(sequelize: Sequelize) {
    ApiToken.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        workspaceId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        tokenPrefix: { type: DataTypes.STRING(16), allowNull: false },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        lastUsedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        revokedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        revokedReason: { type: DataTypes.STRING(200), allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'api_tokens' },
    )
  }
}
