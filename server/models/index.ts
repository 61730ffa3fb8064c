import type { Model, ModelStatic, Sequelize } from 'sequelize'
import { watchAccountTables } from '../database/account-cache'
import { initApiToken } from './api-token'
import { initLoginFailure } from './login-failure'
import { initOutboxMail } from './outbox-mail'
import { initPasswordReset } from './password-reset'
import { initSession } from './session'
import { initSignInAttempt } from './sign-in-attempt'
import { initSketch } from './sketch'
import { initUser } from './user'

/** Binds every model to the connection and wires the associations. */
export function initModels(sequelize: Sequelize) {
  const User = initUser(sequelize)
  const ApiToken = initApiToken(sequelize)
  const LoginFailure = initLoginFailure(sequelize)
  const Sketch = initSketch(sequelize)
  const Session = initSession(sequelize)
  const SignInAttempt = initSignInAttempt(sequelize)
  const OutboxMail = initOutboxMail(sequelize)
  const PasswordReset = initPasswordReset(sequelize)
  User.hasMany(Session, { foreignKey: 'userId', onDelete: 'CASCADE' })
  User.hasMany(ApiToken, { foreignKey: 'userId', onDelete: 'CASCADE' })
  ApiToken.belongsTo(User, { foreignKey: 'userId' })
  User.hasMany(Sketch, { foreignKey: 'ownerId', onDelete: 'CASCADE' })
  Sketch.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' })
  watchAccountTables([User, ApiToken, Session] as unknown as ModelStatic<Model>[])
  return { sequelize, User, ApiToken, LoginFailure, Sketch, Session, SignInAttempt, OutboxMail, PasswordReset }
}

export type Db = ReturnType<typeof initModels>
export { ApiToken } from './api-token'
export { LoginFailure } from './login-failure'
export { OutboxMail } from './outbox-mail'
export { PasswordReset } from './password-reset'
export { Session } from './session'
export { SignInAttempt } from './sign-in-attempt'
export { Sketch } from './sketch'
export { User } from './user'
