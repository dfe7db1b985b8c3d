import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize'
import type { User } from './User'

export class RoomShare extends Model<InferAttributes<RoomShare>, InferCreationAttributes<RoomShare>> {
  declare id: CreationOptional<number>
  declare roomId: number
  declare userId: number
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>
  declare user?: NonAttribute<User>

  static initModel(sequelize: Sequelize) {
    RoomShare.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        roomId: { type: DataTypes.INTEGER, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'room_shares' },
    )
  }
}
