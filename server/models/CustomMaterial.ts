import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A workspace's own absorption material, with the source its values come from. */
export class CustomMaterial extends Model<InferAttributes<CustomMaterial>, InferCreationAttributes<CustomMaterial>> {
  declare id: CreationOptional<number>
  declare workspaceId: number
  declare name: string
  declare kind: 'surface' | 'object'
  declare coefficients: (number | null)[]
  declare source: string
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    CustomMaterial.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        workspaceId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        kind: { type: DataTypes.ENUM('surface', 'object'), allowNull: false },
        coefficients: { type: DataTypes.JSONB, allowNull: false },
        source: { type: DataTypes.STRING(300), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'custom_materials' },
    )
  }
}
