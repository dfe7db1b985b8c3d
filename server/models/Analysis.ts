import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { AnalysisResult } from '../../shared/types/analysis'

/** What the worker computed for a capture with one set of settings; re-analysis adds a row. */
export class Analysis extends Model<InferAttributes<Analysis>, InferCreationAttributes<Analysis>> {
  declare id: CreationOptional<number>
  declare captureId: number
  declare settingsKey: string
  declare engineVersion: string
  declare result: AnalysisResult
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    Analysis.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        captureId: { type: DataTypes.INTEGER, allowNull: false },
        settingsKey: { type: DataTypes.STRING(200), allowNull: false },
        engineVersion: { type: DataTypes.STRING(40), allowNull: false },
        result: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'analyses' },
    )
  }
}
