import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { BandResolution } from '../../shared/types/analysis'

/** A revocable, optionally expiring read-only link to one comparison of a room. */
export class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
  declare id: CreationOptional<number>
  declare roomId: number
  declare createdById: number | null
  declare tokenHash: string
  declare surveyIds: number[]
  declare bands: BandResolution
  declare label: CreationOptional<string>
  declare expiresAt: Date | null
  declare revokedAt: Date | null
  /** The frozen report revision the link shows; null only for links made before revisions existed. */
  declare reportRevisionId: CreationOptional<number | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    ShareLink.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        roomId: { type: DataTypes.INTEGER, allowNull: false },
        createdById: { type: DataTypes.INTEGER, allowNull: true },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        surveyIds: { type: DataTypes.JSONB, allowNull: false },
        bands: { type: DataTypes.STRING(10), allowNull: false },
        label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        expiresAt: { type: DataTypes.DATE, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        reportRevisionId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'share_links' },
    )
  }
}
