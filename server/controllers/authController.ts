import type { Request, Response, NextFunction } from 'express'
import passport from 'passport'
import type { Sequelize } from 'sequelize'
import { describeUser, registerUser } from '../services/authService'
import { HttpError, UnauthenticatedError } from '../errors'
import { currentUserId } from '../middleware/requireAuth'
import type { RegisterBody } from '../../shared/api/auth'
import { acceptInvitation, previewInvitation, type MailContext } from '../services/invitationsService'
import { requestPasswordReset as sendResetLink, resetPassword as applyReset } from '../services/passwordResetService'
import { ForbiddenError } from '../errors'

function logIn(req: Request, user: Express.User): Promise<void> {
  // passport ≥ 0.6 regenerates the session id here (session fixation).
  return new Promise((resolve, reject) => req.logIn(user, (error) => (error ? reject(error) : resolve())))
}

export async function me(req: Request, res: Response) {
  const description = await describeUser(currentUserId(req))
  if (!description) throw new UnauthenticatedError()
  res.json(description)
}

export function signIn(req: Request, res: Response, next: NextFunction) {
  passport.authenticate('local', (error: unknown, user: Express.User | false) => {
    if (error) return next(error)
    if (!user) return next(new HttpError(401, 'invalid-credentials', 'That e-mail and password do not match an account.'))
    logIn(req, user)
      .then(() => describeUser(user.id))
      .then((description) => res.json(description))
      .catch(next)
  })(req, res, next)
}

export function register(sequelize: Sequelize) {
  return async (req: Request, res: Response) => {
    const body = req.body as RegisterBody
    if (body.invitationToken) {
      const invitation = await previewInvitation(body.invitationToken)
      if (invitation.email !== body.email) throw new ForbiddenError(`This invitation is for ${invitation.email}. Register with that address.`, 'invitation-other-email')
    }
    const user = await registerUser(sequelize, body)
    if (body.invitationToken) await acceptInvitation(user.id, body.invitationToken)
    await logIn(req, { id: user.id })
    res.status(201).json(await describeUser(user.id))
  }
}

export function requestPasswordReset(mail: MailContext) {
  return async (req: Request, res: Response) => {
    await sendResetLink((req.body as { email: string }).email, mail)
    res.status(202).json({ message: 'If an account uses that address, a reset link is on its way.' })
  }
}

export function resetPassword(sequelize: Sequelize) {
  return async (req: Request, res: Response) => {
    await applyReset(sequelize, (req.params as { token: string }).token, (req.body as { password: string }).password)
    res.status(204).end()
  }
}

export function signOut(req: Request, res: Response, next: NextFunction) {
  req.logOut((error) => {
    if (error) return next(error)
    req.session.destroy(() => {
      res.clearCookie('ringdown.sid')
      res.status(204).end()
    })
  })
}
