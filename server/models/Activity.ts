import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One line of a room's activity trail: who did what, and when. */
export class Activity extends Model<InferAttributes<Activity>, InferCreationAttributes<Activity>> {
  declare id: CreationOptional<number>
  declare workspaceId: number
  declare roomId: number | null
  declare userId: number | null
  declare action: string
  declare summary: string
  /** The API token the action was taken with; null for browser sessions. */
  declare apiTokenId: CreationOptional<number | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    Activity.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        workspaceId: { type: DataTypes.INTEGER, allowNull: false },
        roomId: { type: DataTypes.INTEGER, allowNull: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(60), allowNull: false },
        summary: { type: DataTypes.STRING(500), allowNull: false },
        apiTokenId: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'activities' },
    )
  }
}
