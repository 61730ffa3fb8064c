import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One failed sign-in, kept for the throttling window. */
export class LoginFailure extends Model<InferAttributes<LoginFailure>, InferCreationAttributes<LoginFailure>> {
  declare id: CreationOptional<string>
  declare email: string
  declare ip: string
  declare createdAt: CreationOptional<Date>
}

export function initLoginFailure(sequelize: Sequelize): typeof LoginFailure {
  LoginFailure.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      email: { type: DataTypes.STRING(254), allowNull: false },
      ip: { type: DataTypes.STRING(64), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'login_failures', updatedAt: false },
  )
  return LoginFailure
}
