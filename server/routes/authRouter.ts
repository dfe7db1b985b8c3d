import { Router } from 'express'
import { ipKeyGenerator, rateLimit } from 'express-rate-limit'
import type { Sequelize } from 'sequelize'
import * as auth from '../controllers/authController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { registerBodySchema, signInBodySchema } from '../../shared/api/auth'
import { linkTokenParamsSchema, passwordResetBodySchema, passwordResetRequestSchema } from '../../shared/api/invitations'
import type { MailContext } from '../services/invitationsService'
import { HttpError } from '../errors'
import { documentRoutes } from '../openapi/routeDocs'
import { meResponseSchema } from '../openapi/responseSchemas'

export function authRouter(options: { sequelize: Sequelize; signInLimitPerWindow: number; generateCsrfToken: (req: Express.Request) => string; mail: MailContext }) {
  const router = Router()
  // Per address and account: slows password guessing without locking out a whole office.
  const signInLimiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: options.signInLimitPerWindow,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}:${String((req.body as { email?: unknown })?.email ?? '').toLowerCase()}`,
    handler: (_req, _res, next) =>
      next(new HttpError(429, 'rate-limited', 'Too many sign-in attempts. Wait 15 minutes and try again.')),
  })

  router.get('/csrf', (req, res) => {
    res.json({ csrfToken: options.generateCsrfToken(req) })
  })
  router.get('/me', requireAuth, auth.me)
  router.post('/sign-in', signInLimiter, validate({ body: signInBodySchema }), auth.signIn)
  router.post('/register', signInLimiter, validate({ body: registerBodySchema }), auth.register(options.sequelize))
  router.post('/sign-out', requireAuth, auth.signOut)
  router.post('/password-reset', signInLimiter, validate({ body: passwordResetRequestSchema }), auth.requestPasswordReset(options.mail))
  router.post(
    '/password-reset/:token',
    signInLimiter,
    validate({ params: linkTokenParamsSchema('That reset link is not valid.'), body: passwordResetBodySchema }),
    auth.resetPassword(options.sequelize),
  )
  return router
}

documentRoutes('Account', {
  'GET /api/auth/csrf': { summary: 'A CSRF token for this browser session', description: 'Browser sessions send it as X-CSRF-Token on every changing request; API tokens need none.', responseDescription: '`{ csrfToken }`' },
  'GET /api/auth/me': { summary: 'The caller and their workspaces with roles', description: 'With an API token: the token’s workspace only, with the token’s role.', response: meResponseSchema },
  'POST /api/auth/sign-in': { summary: 'Sign in with e-mail and password (starts a session)', response: meResponseSchema },
  'POST /api/auth/register': { summary: 'Create an account and its workspace, or join from an invitation', status: 201, response: meResponseSchema },
  'POST /api/auth/sign-out': { summary: 'End the session', status: 204, responseDescription: 'Signed out.' },
  'POST /api/auth/password-reset': { summary: 'Send a password-reset link by e-mail', status: 202, responseDescription: 'Accepted; the same answer whether or not an account uses the address.' },
  'POST /api/auth/password-reset/{token}': { summary: 'Choose a new password with a reset link', status: 204, responseDescription: 'Password changed.' },
})
