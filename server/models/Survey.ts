import type { SurveyAnalysisSettings, SurveyEquipment } from '../../shared/api/surveys'
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

export class Survey extends Model<InferAttributes<Survey>, InferCreationAttributes<Survey>> {
  declare id: CreationOptional<number>
  declare roomId: number
  declare name: string
  /** ISO date (YYYY-MM-DD). */
  declare measuredOn: string
  declare temperatureC: number | null
  declare humidityPercent: number | null
  declare treatmentDescription: CreationOptional<string>
  /** Null = the engine's default settings. */
  declare analysisSettings: CreationOptional<SurveyAnalysisSettings | null>
  declare equipment: CreationOptional<SurveyEquipment | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    Survey.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        roomId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        measuredOn: { type: DataTypes.DATEONLY, allowNull: false },
        temperatureC: { type: DataTypes.DOUBLE, allowNull: true },
        humidityPercent: { type: DataTypes.DOUBLE, allowNull: true },
        treatmentDescription: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        analysisSettings: { type: DataTypes.JSONB, allowNull: true },
        equipment: { type: DataTypes.JSONB, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'surveys' },
    )
  }
}
