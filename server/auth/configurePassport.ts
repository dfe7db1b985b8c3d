import passport from 'passport'
import { Strategy as LocalStrategy } from 'passport-local'
import { User } from '../models'
import { verifyCredentials } from '../services/authService'

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User {
      id: number
      /** Set when the request authenticated with an API token (server/middleware/apiTokenAuth.ts). */
      tokenScope?: import('./actingScope').TokenScope
    }
  }
}

/** passport-local with e-mail + password; the session stores only the user id. */
export function configurePassport(): passport.PassportStatic {
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      verifyCredentials(email, password)
        .then((user) => done(null, user ? { id: user.id } : false))
        .catch(done)
    }),
  )
  passport.serializeUser((user, done) => done(null, user.id))
  passport.deserializeUser((id: number, done) => {
    User.findByPk(id, { attributes: ['id'] })
      .then((user) => done(null, user ? { id: user.id } : false))
      .catch(done)
  })
  return passport
}
