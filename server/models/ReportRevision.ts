import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { BandResolution } from '../../shared/types/analysis'
import type { ReportSnapshot } from '../../shared/api/reportRevisions'

/**
 * One revision of a room's report. A draft (frozenAt null) only records what changed since the
 * last frozen revision; freezing (sending or sharing) stores the snapshot and the PDF for good.
 */
export class ReportRevision extends Model<InferAttributes<ReportRevision>, InferCreationAttributes<ReportRevision>> {
  declare id: CreationOptional<number>
  declare roomId: number
  declare number: number
  declare surveyIds: number[]
  declare bands: BandResolution
  declare changeNotes: CreationOptional<string[]>
  declare frozenAt: Date | null
  declare frozenById: number | null
  declare inputsSha256: string | null
  declare snapshot: ReportSnapshot | null
  declare pdf: Buffer | null
  declare recipients: CreationOptional<{ email: string; sentAt: string }[]>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    ReportRevision.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        roomId: { type: DataTypes.INTEGER, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        surveyIds: { type: DataTypes.JSONB, allowNull: false },
        bands: { type: DataTypes.STRING(10), allowNull: false },
        changeNotes: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        frozenAt: { type: DataTypes.DATE, allowNull: true },
        frozenById: { type: DataTypes.INTEGER, allowNull: true },
        inputsSha256: { type: DataTypes.STRING(64), allowNull: true },
        snapshot: { type: DataTypes.JSONB, allowNull: true },
        pdf: { type: DataTypes.BLOB, allowNull: true },
        recipients: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'report_revisions' },
    )
  }
}
