import { Op } from 'sequelize'
import { ReportRevision, Survey, type Room } from '../models'
import { ConflictError, NotFoundError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import { mayOnRoom } from '../policy/policy'
import { recordActivity } from './activityService'
import { buildReportSnapshot, reportInputsSha256 } from './reportSnapshot'
import { renderReportPdf } from '../reports/renderReportPdf'
import type { ReportRevisionDetailDto, ReportRevisionDto } from '../../shared/api/reportRevisions'
import type { BandResolution } from '../../shared/types/analysis'

const sameSurveys = (a: number[], b: number[]) => a.length === b.length && a.every((id, i) => id === b[i])

async function surveyNamesOf(revision: ReportRevision): Promise<string[]> {
  if (revision.snapshot) return revision.snapshot.comparison.surveys.map((s) => s.summary.survey.name)
  const surveys = await Survey.findAll({ where: { id: revision.surveyIds }, attributes: ['id', 'name'] })
  return revision.surveyIds.map((id) => surveys.find((s) => s.id === id)?.name ?? 'deleted survey')
}

async function toDto(revision: ReportRevision): Promise<ReportRevisionDto> {
  return {
    id: revision.id,
    number: revision.number,
    status: revision.frozenAt ? 'sent' : 'draft',
    surveyIds: revision.surveyIds,
    bands: revision.bands,
    surveyNames: await surveyNamesOf(revision),
    changeNotes: revision.changeNotes,
    frozenAt: revision.frozenAt?.toISOString() ?? null,
    recipients: revision.recipients,
    summaryLine: revision.snapshot?.comparison.summaryLine ?? null,
    createdAt: revision.createdAt.toISOString(),
  }
}

/**
 * Freezes the report of a comparison as a revision: the captures used and left out, the analysis
 * that counted for each, the target, the verdict, the consultancy block and the PDF are stored as
 * they are now and never change afterwards. A send whose inputs equal the latest sent revision of
 * the same comparison reuses it; otherwise the open draft (or a new number) is frozen. Refused
 * (409) while positions are unanalysed, pending or failed.
 */
export async function freezeRevision(userId: number, room: Room, surveyIds: number[], bands: BandResolution): Promise<ReportRevision> {
  const revisions = await ReportRevision.findAll({ where: { roomId: room.id }, order: [['number', 'DESC']], attributes: { exclude: ['pdf', 'snapshot'] } })
  const latest = revisions[0]
  const draft = latest && latest.frozenAt === null ? latest : null
  const number = draft?.number ?? (latest?.number ?? 0) + 1
  const frozenAt = new Date()
  const { snapshot, logo } = await buildReportSnapshot(room, surveyIds, bands, { userId, revisionNumber: number, frozenAt })
  if (snapshot.comparison.reportBlockers.length > 0) {
    throw new ConflictError('report-not-ready', `This report cannot be sent yet. ${snapshot.comparison.reportBlockers.join(' ')}`)
  }
  const inputsSha256 = reportInputsSha256(snapshot.comparison)
  const lastSent = revisions.find((r) => r.frozenAt !== null && r.bands === bands && sameSurveys(r.surveyIds, surveyIds))
  if (lastSent && lastSent.inputsSha256 === inputsSha256) {
    // Nothing the verdict rests on changed (e.g. a position excluded and included again): the draft is moot.
    if (draft && draft.bands === bands && sameSurveys(draft.surveyIds, surveyIds)) await draft.destroy()
    return lastSent
  }
  const pdf = await renderReportPdf(snapshot, { logo, isDraft: false })
  const fields = { surveyIds, bands, frozenAt, frozenById: userId, inputsSha256, snapshot, pdf }
  const revision = draft ? await draft.update(fields) : await ReportRevision.create({ roomId: room.id, number, changeNotes: [], ...fields })
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'report.frozen', summary: `froze report revision ${number} (${snapshot.comparison.surveys.map((s) => `“${s.summary.survey.name}”`).join(' → ')})` })
  return revision
}

/** Adds a recipient to a frozen revision (every send is listed with its date). */
export async function addRevisionRecipient(revisionId: number, email: string): Promise<void> {
  const revision = await ReportRevision.findByPk(revisionId, { attributes: ['id', 'recipients'] })
  if (revision) await revision.update({ recipients: [...revision.recipients, { email, sentAt: new Date().toISOString() }] })
}

/** A room's revisions, newest first. Clients and viewers see the sent ones, owners and engineers the draft as well. */
export async function listRevisions(userId: number, roomId: number): Promise<ReportRevisionDto[]> {
  const { role, isShared } = await requireRoomAccess(userId, roomId, 'room:read')
  const seesDrafts = mayOnRoom(role, isShared, 'room:share')
  const revisions = await ReportRevision.findAll({
    where: { roomId, ...(seesDrafts ? {} : { frozenAt: { [Op.ne]: null } }) },
    attributes: { exclude: ['pdf'] },
    order: [['number', 'DESC']],
  })
  return Promise.all(revisions.map(toDto))
}

async function requireFrozenRevision(userId: number, roomId: number, revisionId: number): Promise<ReportRevision> {
  await requireRoomAccess(userId, roomId, 'room:read')
  const revision = await ReportRevision.findOne({ where: { id: revisionId, roomId, frozenAt: { [Op.ne]: null } } })
  if (!revision) throw new NotFoundError('That report revision')
  return revision
}

export async function getRevision(userId: number, roomId: number, revisionId: number): Promise<ReportRevisionDetailDto> {
  const revision = await requireFrozenRevision(userId, roomId, revisionId)
  return { ...(await toDto(revision)), snapshot: revision.snapshot! }
}

export async function revisionPdf(userId: number, roomId: number, revisionId: number): Promise<{ pdf: Buffer; roomName: string; number: number }> {
  const revision = await requireFrozenRevision(userId, roomId, revisionId)
  return { pdf: revision.pdf!, roomName: revision.snapshot!.comparison.roomName, number: revision.number }
}

/** The revision a share link shows (frozen), with its stored PDF. */
export async function revisionForLink(revisionId: number): Promise<ReportRevision> {
  const revision = await ReportRevision.findByPk(revisionId)
  if (!revision || !revision.frozenAt) throw new NotFoundError('That shared report')
  return revision
}
