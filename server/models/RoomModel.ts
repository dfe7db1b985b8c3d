import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { LayoutDto, TreatmentDto } from '../../shared/api/roomModel'

/** A room's speaker/listener layout and treatment plan (the room model's saved inputs). */
export class RoomModel extends Model<InferAttributes<RoomModel>, InferCreationAttributes<RoomModel>> {
  declare id: CreationOptional<number>
  declare roomId: number
  declare layout: LayoutDto | null
  declare treatment: TreatmentDto | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    RoomModel.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        roomId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        layout: { type: DataTypes.JSONB, allowNull: true },
        treatment: { type: DataTypes.JSONB, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'room_models' },
    )
  }
}
