import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { AnalysisResult, AnalysisSettings } from '../../shared/types/analysis'
import { ANALYSIS_STATUSES, type AnalysisStatus } from '../../shared/jobs/analysisJob'

/**
 * One analysis of a capture with one set of settings, and the job record of computing it: the
 * server creates it `queued` when it enqueues, the worker moves it to `analysing` and `done` (with
 * the result and the list's headline figures) or `failed` (with the error). Re-analysis with other
 * settings adds a row; the same settings reuse it.
 */
export class Analysis extends Model<InferAttributes<Analysis>, InferCreationAttributes<Analysis>> {
  declare id: CreationOptional<number>
  declare captureId: number
  /** Canonical JSON of `settings` (shared/jobs/analysisSettingsKey.ts): unique per capture. */
  declare settingsKey: string
  declare settings: AnalysisSettings
  declare status: CreationOptional<AnalysisStatus>
  declare statusMessage: CreationOptional<string | null>
  declare error: CreationOptional<string | null>
  declare attempts: CreationOptional<number>
  declare engineVersion: CreationOptional<string | null>
  declare result: CreationOptional<AnalysisResult | null>
  declare headlineT30S: CreationOptional<number | null>
  declare headlineT20S: CreationOptional<number | null>
  declare headlineEDTS: CreationOptional<number | null>
  declare headlineC80Db: CreationOptional<number | null>
  declare queuedAt: CreationOptional<Date>
  /** When BullMQ accepted the job; null while Redis was unreachable (the queue pass retries). */
  declare enqueuedAt: CreationOptional<Date | null>
  declare startedAt: CreationOptional<Date | null>
  declare finishedAt: CreationOptional<Date | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    Analysis.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        captureId: { type: DataTypes.INTEGER, allowNull: false },
        settingsKey: { type: DataTypes.STRING(200), allowNull: false },
        settings: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.ENUM(...ANALYSIS_STATUSES), allowNull: false, defaultValue: 'queued' },
        statusMessage: { type: DataTypes.TEXT, allowNull: true },
        error: { type: DataTypes.TEXT, allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        engineVersion: { type: DataTypes.STRING(40), allowNull: true },
        result: { type: DataTypes.JSONB, allowNull: true },
        headlineT30S: { type: DataTypes.DOUBLE, allowNull: true, field: 'headline_t30_s' },
        headlineT20S: { type: DataTypes.DOUBLE, allowNull: true, field: 'headline_t20_s' },
        headlineEDTS: { type: DataTypes.DOUBLE, allowNull: true, field: 'headline_edt_s' },
        headlineC80Db: { type: DataTypes.DOUBLE, allowNull: true, field: 'headline_c80_db' },
        queuedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        enqueuedAt: { type: DataTypes.DATE, allowNull: true },
        startedAt: { type: DataTypes.DATE, allowNull: true },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'analyses' },
    )
  }
}
