import type { Model, ModelStatic, Sequelize } from 'sequelize'
import { watchAccountTables } from '../database/account-cache'
import { initActivity } from './activity'
import { initApiToken } from './api-token'
import { initComment } from './comment'
import { initInvitation } from './invitation'
import { initLink } from './link'
import { initMailboxMail } from './mailbox-mail'
import { initRevision } from './revision'
import { initSetting } from './setting'
import { initShare } from './share'
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
  const Share = initShare(sequelize)
  const Invitation = initInvitation(sequelize)
  const Revision = initRevision(sequelize)
  const Link = initLink(sequelize)
  const Comment = initComment(sequelize)
  const Activity = initActivity(sequelize)
  const MailboxMail = initMailboxMail(sequelize)
  const Setting = initSetting(sequelize)
  User.hasMany(Session, { foreignKey: 'userId', onDelete: 'CASCADE' })
  User.hasMany(ApiToken, { foreignKey: 'userId', onDelete: 'CASCADE' })
  ApiToken.belongsTo(User, { foreignKey: 'userId' })
  User.hasMany(Sketch, { foreignKey: 'ownerId', onDelete: 'CASCADE' })
  Sketch.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' })
  watchAccountTables([User, ApiToken, Session] as unknown as ModelStatic<Model>[])
  return { sequelize, User, ApiToken, LoginFailure, Sketch, Session, SignInAttempt, OutboxMail, PasswordReset, Share, Invitation, Revision, Link, Comment, Activity, MailboxMail, Setting }
}

export type Db = ReturnType<typeof initModels>
export { Activity } from './activity'
export { ApiToken } from './api-token'
export { Comment } from './comment'
export { Invitation } from './invitation'
export { Link } from './link'
export { MailboxMail } from './mailbox-mail'
export { Revision } from './revision'
export { Setting } from './setting'
export { Share } from './share'
export { LoginFailure } from './login-failure'
export { OutboxMail } from './outbox-mail'
export { PasswordReset } from './password-reset'
export { Session } from './session'
export { SignInAttempt } from './sign-in-attempt'
export { Sketch } from './sketch'
export { User } from './user'
