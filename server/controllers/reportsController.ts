import type { Request, Response } from 'express'
import { currentUserId } from '../middleware/requireAuth'
import * as reports from '../services/reportsService'
import type { MailContext } from '../services/invitationsService'
import type { SendReportBody } from '../../shared/api/invitations'
import type { BandResolution } from '../../shared/types/analysis'

function sendPdf(res: Response, pdf: Buffer, roomName: string) {
  const fileName = `ringdown-report-${roomName.replace(/[^a-z0-9]+/gi, '-').toLowerCase()}.pdf`
  res.type('application/pdf').attachment(fileName).send(pdf)
}

export async function roomReport(req: Request, res: Response) {
  const { roomId } = req.params as unknown as { roomId: number }
  const { surveys, bands } = req.query as unknown as { surveys: number[]; bands: BandResolution }
  const { pdf, roomName } = await reports.comparisonReportPdf(currentUserId(req), roomId, surveys, bands)
  sendPdf(res, pdf, roomName)
}

export async function sharedReport(req: Request, res: Response) {
  const { pdf, roomName } = await reports.sharedReportPdf((req.params as unknown as { token: string }).token)
  sendPdf(res, pdf, roomName)
}

export function send(context: MailContext) {
  return async (req: Request, res: Response) => {
    const { roomId } = req.params as unknown as { roomId: number }
    res.status(201).json(await reports.sendReport(currentUserId(req), roomId, req.body as SendReportBody, context))
  }
}
