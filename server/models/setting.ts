import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One workspace setting (JSON text under a key). */
export class Setting extends Model<InferAttributes<Setting>, InferCreationAttributes<Setting>> {
  declare key: string
  declare value: string
  declare updatedAt: CreationOptional<Date>
}

/** Binds the Setting model to the connection. */
export function initSetting(sequelize: Sequelize): typeof Setting {
  Setting.init(
    {
      key: { type: DataTypes.STRING(60), primaryKey: true },
      value: { type: DataTypes.TEXT, allowNull: false },
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'settings', createdAt: false },
  )
  return Setting
}
