import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import { ROOM_USES, type RoomUse } from '../../shared/api/rooms'

export class Room extends Model<InferAttributes<Room>, InferCreationAttributes<Room>> {
  declare id: CreationOptional<number>
  declare workspaceId: number
  declare name: string
  declare clientName: CreationOptional<string>
  declare address: CreationOptional<string>
  declare use: RoomUse
  declare lengthM: number | null
  declare widthM: number | null
  declare heightM: number | null
  declare volumeM3: number | null
  declare targetProfile: CreationOptional<string>
  declare notes: CreationOptional<string>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  /** The volume calculations use: the given volume (irregular rooms), else L×W×H; null if neither. */
  effectiveVolumeM3(): number | null {
    if (this.volumeM3 !== null) return this.volumeM3
    if (this.lengthM === null || this.widthM === null || this.heightM === null) return null
    return this.lengthM * this.widthM * this.heightM
  }

  static initModel(sequelize: Sequelize) {
    Room.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        workspaceId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        clientName: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        address: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        use: { type: DataTypes.ENUM(...ROOM_USES), allowNull: false },
        lengthM: { type: DataTypes.DOUBLE, allowNull: true },
        widthM: { type: DataTypes.DOUBLE, allowNull: true },
        heightM: { type: DataTypes.DOUBLE, allowNull: true },
        volumeM3: { type: DataTypes.DOUBLE, allowNull: true },
        targetProfile: { type: DataTypes.STRING(60), allowNull: false, defaultValue: 'auto' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'rooms' },
    )
  }
}
