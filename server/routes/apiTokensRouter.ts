import { Router } from 'express'
import { z } from 'zod'
import * as apiTokens from '../controllers/apiTokensController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import { apiTokenActivitySchema, apiTokenDtoSchema, createApiTokenBodySchema, createdApiTokenSchema } from '../../shared/api/apiTokens'
import { documentRoutes } from '../openapi/routeDocs'

const tokenParams = z.object({ tokenId: idParam })

/** The signed-in person's API tokens (session only: a token cannot manage tokens). */
export function apiTokensRouter() {
  const router = Router()
  router.use(requireAuth)
  router.get('/', apiTokens.list)
  router.post('/', validate({ body: createApiTokenBodySchema }), apiTokens.create)
  router.delete('/:tokenId', validate({ params: tokenParams }), apiTokens.revoke)
  router.get('/:tokenId/activity', validate({ params: tokenParams }), apiTokens.activity)
  return router
}

documentRoutes('API tokens', {
  'GET /api/tokens': { summary: 'The signed-in person’s API tokens in every workspace', response: z.array(apiTokenDtoSchema) },
  'POST /api/tokens': { summary: 'Create an API token; its secret is in this answer only', status: 201, response: createdApiTokenSchema },
  'DELETE /api/tokens/{tokenId}': { summary: 'Revoke an API token at once', response: apiTokenDtoSchema },
  'GET /api/tokens/{tokenId}/activity': { summary: 'What was done with a token: changing and refused requests, newest first', response: z.array(apiTokenActivitySchema) },
})
