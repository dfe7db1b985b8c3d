import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as targets from '../services/customTargetsService'
import * as profile from '../services/workspaceProfileService'
import type { CustomTargetBody } from '../../shared/api/targets'
import type { WorkspaceProfileBody } from '../../shared/api/workspaceProfile'

type WorkspaceParams = { workspaceId: number }
type TargetParams = WorkspaceParams & { targetId: number }
const workspaceOf = (req: Request) => (req.params as unknown as WorkspaceParams).workspaceId

export async function listTargets(req: Request, res: Response) {
  res.json(await targets.listCustomTargets(currentUserId(req), workspaceOf(req)))
}

export async function targetOptions(req: Request, res: Response) {
  res.json(await targets.listTargetOptions(currentUserId(req), workspaceOf(req)))
}

export async function createTarget(req: Request, res: Response) {
  res.status(201).json(await targets.createCustomTarget(currentUserId(req), workspaceOf(req), req.body as CustomTargetBody))
}

export async function updateTarget(req: Request, res: Response) {
  const { workspaceId, targetId } = req.params as unknown as TargetParams
  res.json(await targets.updateCustomTarget(currentUserId(req), workspaceId, targetId, req.body as CustomTargetBody))
}

export async function deleteTarget(req: Request, res: Response) {
  const { workspaceId, targetId } = req.params as unknown as TargetParams
  await targets.deleteCustomTarget(currentUserId(req), workspaceId, targetId)
  res.status(204).end()
}

export async function showProfile(req: Request, res: Response) {
  res.json(await profile.getWorkspaceProfile(currentUserId(req), workspaceOf(req)))
}

export async function updateProfile(req: Request, res: Response) {
  res.json(await profile.updateWorkspaceProfile(currentUserId(req), workspaceOf(req), req.body as WorkspaceProfileBody))
}

export async function setLogo(req: Request, res: Response) {
  res.json(await profile.setWorkspaceLogo(currentUserId(req), workspaceOf(req), Buffer.isBuffer(req.body) ? req.body : undefined))
}

export async function removeLogo(req: Request, res: Response) {
  res.json(await profile.removeWorkspaceLogo(currentUserId(req), workspaceOf(req)))
}

export async function showLogo(req: Request, res: Response) {
  const { bytes, contentType } = await profile.getWorkspaceLogo(currentUserId(req), workspaceOf(req))
  res.type(contentType).set('Cache-Control', 'private, no-cache').send(bytes)
}
