import type { Sequelize } from 'sequelize'
import { PasswordReset, User } from '../models'
import { HttpError, NotFoundError } from '../errors'
import { createSingleUseToken, hashToken } from '../auth/singleUseToken'
import { passwordResetMail } from '../mail/messages'
import { hashPassword } from './authService'
import type { MailContext } from './invitationsService'
import { logger } from '../logger'

const RESET_LIFETIME_MS = 3600 * 1000

/** Sends a reset link when the account exists; answers the same either way (no account probing). */
export async function requestPasswordReset(email: string, context: MailContext): Promise<void> {
  const user = await User.findOne({ where: { email } })
  if (!user) return
  const { token, tokenHash } = createSingleUseToken()
  const expiresAt = new Date(Date.now() + RESET_LIFETIME_MS)
  await PasswordReset.create({ userId: user.id, tokenHash, expiresAt, usedAt: null })
  await context.mailer.send(passwordResetMail({ to: user.email, link: `${context.publicUrl}/reset-password/${token}`, expiresAt })).catch((error: unknown) => {
    logger.error({ err: error }, 'password reset mail failed')
  })
}

/** Sets a new password with a single-use token and signs the account out everywhere. */
export async function resetPassword(sequelize: Sequelize, token: string, password: string): Promise<void> {
  const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(token) } })
  if (!reset) throw new NotFoundError('That reset link')
  if (reset.usedAt) throw new HttpError(410, 'reset-used', 'This reset link has been used already. Ask for a new one.')
  if (reset.expiresAt.getTime() < Date.now()) throw new HttpError(410, 'reset-expired', 'This reset link has expired. Ask for a new one.')
  const passwordHash = await hashPassword(password)
  await sequelize.transaction(async (transaction) => {
    const [claimed] = await PasswordReset.update({ usedAt: new Date() }, { where: { id: reset.id, usedAt: null }, transaction })
    if (claimed === 0) throw new HttpError(410, 'reset-used', 'This reset link has been used already.')
    await User.update({ passwordHash }, { where: { id: reset.userId }, transaction })
    await sequelize.query(`DELETE FROM sessions WHERE sess->'passport'->>'user' = :userId`, { replacements: { userId: String(reset.userId) }, transaction })
  })
}
