import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as members from '../services/membersService'
import type { AddMemberBody, UpdateMemberBody } from '../../shared/api/members'

type MemberParams = { workspaceId: number; userId: number }

export async function list(req: Request, res: Response) {
  const { workspaceId } = req.params as unknown as MemberParams
  res.json(await members.listMembers(currentUserId(req), workspaceId))
}

export async function add(req: Request, res: Response) {
  const { workspaceId } = req.params as unknown as MemberParams
  res.status(201).json(await members.addMember(currentUserId(req), workspaceId, req.body as AddMemberBody))
}

export async function update(req: Request, res: Response) {
  const { workspaceId, userId } = req.params as unknown as MemberParams
  res.json(await members.updateMember(currentUserId(req), workspaceId, userId, req.body as UpdateMemberBody))
}

export async function remove(req: Request, res: Response) {
  const { workspaceId, userId } = req.params as unknown as MemberParams
  await members.removeMember(currentUserId(req), workspaceId, userId)
  res.status(204).end()
}
