import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One sign-in attempt, written before its password is checked; a success removes its own row. */
export class SignInAttempt extends Model<InferAttributes<SignInAttempt>, InferCreationAttributes<SignInAttempt>> {
  declare id: CreationOptional<number>
  declare email: string
  declare ip: string
  declare createdAt: CreationOptional<Date>
}

/** Binds the SignInAttempt model to the connection. */
export function initSignInAttempt(sequelize: Sequelize): typeof SignInAttempt {
  SignInAttempt.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      email: { type: DataTypes.STRING(254), allowNull: false },
      ip: { type: DataTypes.STRING(64), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'sign_in_attempts', updatedAt: false },
  )
  return SignInAttempt
}
