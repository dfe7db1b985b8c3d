import type { Request, Response, NextFunction } from 'express'
import passport from 'passport'
import type { Sequelize } from 'sequelize'
import { describeUser, registerUser } from '../services/authService'
import { HttpError, UnauthenticatedError } from '../errors'
import { currentUserId } from '../middleware/requireAuth'
import type { RegisterBody } from '../../shared/api/auth'

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
    const user = await registerUser(sequelize, req.body as RegisterBody)
    await logIn(req, { id: user.id })
    res.status(201).json(await describeUser(user.id))
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
