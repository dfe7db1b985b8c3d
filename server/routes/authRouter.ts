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
