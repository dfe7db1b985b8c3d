import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { CaptureKind } from '../../shared/types/analysis'

/** One uploaded or recorded file in a survey, with its file facts; its state is derived from its analyses. */
export class Capture extends Model<InferAttributes<Capture>, InferCreationAttributes<Capture>> {
  declare id: CreationOptional<number>
  declare surveyId: number
  declare uploadedById: number | null
  declare kind: CaptureKind
  declare channel: CreationOptional<number>
  declare sourceLabel: CreationOptional<string>
  declare receiverLabel: CreationOptional<string>
  declare positionXM: number | null
  declare positionYM: number | null
  declare positionZM: number | null
  declare sweepF1Hz: number | null
  declare sweepF2Hz: number | null
  declare sweepDurationS: number | null
  declare referenceSha256: string | null
  declare originalName: string
  declare sha256: string
  declare byteSize: number
  declare sampleRateHz: number
  declare bitDepth: number
  declare channelCount: number
  declare durationS: number
  declare excludedAt: CreationOptional<Date | null>
  declare exclusionReason: CreationOptional<string | null>
  declare excludedById: CreationOptional<number | null>
  declare pinnedAnalysisId: CreationOptional<number | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    Capture.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        surveyId: { type: DataTypes.INTEGER, allowNull: false },
        uploadedById: { type: DataTypes.INTEGER, allowNull: true },
        kind: { type: DataTypes.ENUM('impulse', 'sweep'), allowNull: false },
        channel: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        sourceLabel: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        receiverLabel: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        positionXM: { type: DataTypes.DOUBLE, allowNull: true, field: 'position_x_m' },
        positionYM: { type: DataTypes.DOUBLE, allowNull: true, field: 'position_y_m' },
        positionZM: { type: DataTypes.DOUBLE, allowNull: true, field: 'position_z_m' },
        sweepF1Hz: { type: DataTypes.DOUBLE, allowNull: true, field: 'sweep_f1_hz' },
        sweepF2Hz: { type: DataTypes.DOUBLE, allowNull: true, field: 'sweep_f2_hz' },
        sweepDurationS: { type: DataTypes.DOUBLE, allowNull: true },
        referenceSha256: { type: DataTypes.STRING(64), allowNull: true, field: 'reference_sha256' },
        originalName: { type: DataTypes.STRING(255), allowNull: false },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        byteSize: { type: DataTypes.BIGINT, allowNull: false },
        sampleRateHz: { type: DataTypes.INTEGER, allowNull: false },
        bitDepth: { type: DataTypes.INTEGER, allowNull: false },
        channelCount: { type: DataTypes.INTEGER, allowNull: false },
        durationS: { type: DataTypes.DOUBLE, allowNull: false },
        excludedAt: { type: DataTypes.DATE, allowNull: true },
        exclusionReason: { type: DataTypes.STRING(300), allowNull: true },
        excludedById: { type: DataTypes.INTEGER, allowNull: true },
        pinnedAnalysisId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'captures' },
    )
  }
}
