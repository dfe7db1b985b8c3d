import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** How a workspace (a consultancy) presents itself on its reports: name, address, contact, logo. */
export class WorkspaceProfile extends Model<InferAttributes<WorkspaceProfile>, InferCreationAttributes<WorkspaceProfile>> {
  declare id: CreationOptional<number>
  declare workspaceId: number
  declare consultancyName: CreationOptional<string>
  declare address: CreationOptional<string>
  declare contact: CreationOptional<string>
  declare logo: Buffer | null
  declare logoContentType: 'image/png' | 'image/jpeg' | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize) {
    WorkspaceProfile.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        workspaceId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        consultancyName: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        address: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        contact: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        logo: { type: DataTypes.BLOB, allowNull: true },
        logoContentType: { type: DataTypes.STRING(20), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'workspace_profiles' },
    )
  }
}
