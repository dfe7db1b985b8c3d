import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as invitations from '../services/invitationsService'
import * as shareLinks from '../services/shareLinksService'
import { listRoomActivity } from '../services/activityService'
import type { MailContext } from '../services/invitationsService'
import type { CreateInvitationBody, CreateShareLinkBody } from '../../shared/api/invitations'

type TokenParams = { token: string }

export function create(context: MailContext) {
  return async (req: Request, res: Response) => {
    const { workspaceId } = req.params as unknown as { workspaceId: number }
    res.status(201).json(await invitations.createInvitation(currentUserId(req), workspaceId, req.body as CreateInvitationBody, context))
  }
}

export async function list(req: Request, res: Response) {
  res.json(await invitations.listInvitations(currentUserId(req), (req.params as unknown as { workspaceId: number }).workspaceId))
}

export async function preview(req: Request, res: Response) {
  res.json(await invitations.previewInvitation((req.params as unknown as TokenParams).token))
}

export async function accept(req: Request, res: Response) {
  res.json(await invitations.acceptInvitation(currentUserId(req), (req.params as unknown as TokenParams).token))
}

export function createShareLink(publicUrl: string) {
  return async (req: Request, res: Response) => {
    const { roomId } = req.params as unknown as { roomId: number }
    res.status(201).json((await shareLinks.createShareLink(currentUserId(req), roomId, req.body as CreateShareLinkBody, publicUrl)).link)
  }
}

export async function listShareLinks(req: Request, res: Response) {
  res.json(await shareLinks.listShareLinks(currentUserId(req), (req.params as unknown as { roomId: number }).roomId))
}

export async function revokeShareLink(req: Request, res: Response) {
  const { roomId, linkId } = req.params as unknown as { roomId: number; linkId: number }
  await shareLinks.revokeShareLink(currentUserId(req), roomId, linkId)
  res.status(204).end()
}

export async function viewShared(req: Request, res: Response) {
  res.json(await shareLinks.viewSharedComparison((req.params as unknown as TokenParams).token))
}

export async function activity(req: Request, res: Response) {
  res.json(await listRoomActivity(currentUserId(req), (req.params as unknown as { roomId: number }).roomId))
}
