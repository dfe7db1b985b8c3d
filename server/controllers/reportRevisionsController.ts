import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as revisions from '../services/reportRevisionsService'

type RevisionParams = { roomId: number; revisionId: number }

export async function list(req: Request, res: Response) {
  res.json(await revisions.listRevisions(currentUserId(req), (req.params as unknown as { roomId: number }).roomId))
}

export async function show(req: Request, res: Response) {
  const { roomId, revisionId } = req.params as unknown as RevisionParams
  res.json(await revisions.getRevision(currentUserId(req), roomId, revisionId))
}

export async function pdf(req: Request, res: Response) {
  const { roomId, revisionId } = req.params as unknown as RevisionParams
  const { pdf, roomName, number } = await revisions.revisionPdf(currentUserId(req), roomId, revisionId)
  const fileName = `ringdown-report-${roomName.replace(/[^a-z0-9]+/gi, '-').toLowerCase()}-revision-${number}.pdf`
  res.type('application/pdf').attachment(fileName).send(pdf)
}
