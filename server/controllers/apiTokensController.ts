import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as apiTokens from '../services/apiTokensService'
import type { CreateApiTokenBody } from '../../shared/api/apiTokens'

type TokenParams = { tokenId: number }

export async function list(req: Request, res: Response) {
  res.json(await apiTokens.listApiTokens(currentUserId(req)))
}

export async function create(req: Request, res: Response) {
  res.status(201).json(await apiTokens.createApiToken(currentUserId(req), req.body as CreateApiTokenBody))
}

export async function revoke(req: Request, res: Response) {
  res.json(await apiTokens.revokeApiToken(currentUserId(req), (req.params as unknown as TokenParams).tokenId))
}

export async function activity(req: Request, res: Response) {
  res.json(await apiTokens.listApiTokenActivity(currentUserId(req), (req.params as unknown as TokenParams).tokenId))
}
