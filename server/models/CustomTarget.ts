import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

export interface OctaveLimit {
  centreHz: number
  minS: number | null
  maxS: number | null
}

/** A target a workspace defines itself: limits per octave band and where they come from. */
export class CustomTarget extends Model<InferAttributes<CustomTarget>, InferCreationAttributes<CustomTarget>> {
  declare id: CreationOptional<number>
  declare workspaceId: number
  declare name: string
  declare sourceNote: string
  declare octaveLimits: OctaveLimit[]
  declare createdById: number | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    CustomTarget.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        workspaceId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        sourceNote: { type: DataTypes.STRING(500), allowNull: false },
        octaveLimits: { type: DataTypes.JSONB, allowNull: false },
        createdById: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'custom_targets' },
    )
  }
}
