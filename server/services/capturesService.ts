import { readFile, rm } from 'node:fs/promises'
import { Analysis, Capture } from '../models'
import { ForbiddenError, NotFoundError, ValidationError } from '../errors'
import { requireSurveyAccess } from './surveysService'
import { requireRoomAccess } from '../policy/roomAccess'
import { mayOnRoom } from '../policy/policy'
import { storeUploadedFile } from '../storage/storeUploadedFile'
import { contentPath } from '../storage/contentPath'
import { readWavFacts } from '../../shared/acoustics/wav/readWavFacts'
import { DspInputError } from '../../shared/acoustics/errors'
import { literal, Op, type OrderItem } from 'sequelize'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisDto, CaptureDto, CapturePageDto, CaptureSortKey, CreateCaptureFields, ListCapturesQuery } from '../../shared/api/captures'
import type { AnalysisSettings } from '../../shared/types/analysis'
import { DEFAULT_ANALYSIS_SETTINGS } from '../../shared/jobs/analysisSettingsKey'
import { recordActivity } from './activityService'
import { dispatchAnalysis, recordAnalysisRequest } from './analysisJobsService'
import { captureViewOf, loadCaptureViews, toStateRow, type AnalysisStateRow, type CaptureView } from './captureStates'

export interface UploadedFile {
  path: string
  originalname: string
  size: number
}

export function toCaptureDto(capture: Capture, view: CaptureView): CaptureDto {
  return {
    id: capture.id,
    surveyId: capture.surveyId,
    uploadedById: capture.uploadedById,
    kind: capture.kind,
    channel: capture.channel,
    sourceLabel: capture.sourceLabel,
    receiverLabel: capture.receiverLabel,
    positionXM: capture.positionXM,
    positionYM: capture.positionYM,
    positionZM: capture.positionZM,
    sweepF1Hz: capture.sweepF1Hz,
    sweepF2Hz: capture.sweepF2Hz,
    sweepDurationS: capture.sweepDurationS,
    hasReferenceSweep: capture.referenceSha256 !== null,
    originalName: capture.originalName,
    sha256: capture.sha256,
    byteSize: Number(capture.byteSize),
    sampleRateHz: capture.sampleRateHz,
    bitDepth: capture.bitDepth,
    channelCount: capture.channelCount,
    durationS: capture.durationS,
    status: view.state.status,
    statusMessage: view.state.statusMessage,
    shownAnalysisId: view.state.shownAnalysisId,
    headline: view.headline,
    createdAt: capture.createdAt.toISOString(),
    updatedAt: capture.updatedAt.toISOString(),
  }
}

/**
 * Reads a WAV's header facts. The whole file is read because wavefile parses the container from
 * one buffer; a streaming header reader would keep large uploads out of memory (noted for later).
 */
async function wavFactsOfFile(file: UploadedFile, field: 'file' | 'reference') {
  try {
    return readWavFacts(new Uint8Array(await readFile(file.path)))
  } catch (error) {
    if (error instanceof DspInputError) {
      const label = field === 'file' ? 'The file' : 'The reference sweep'
      throw new ValidationError(`${label}: ${error.message}`, { [field]: error.message })
    }
    throw error
  }
}

/** Checks, before any byte is accepted, that the caller may add captures to the survey. */
export async function assertMayAddCapture(userId: number, surveyId: number): Promise<void> {
  await requireSurveyAccess(userId, surveyId, 'capture:create')
}

/**
 * Validates the uploaded WAV(s), stores them content-addressed, writes the capture row with the job
 * record of its first analysis and enqueues it. On any failure nothing is left behind: temporary
 * files are removed, and a newly stored file is removed again when its row could not be written.
 * When Redis is down the capture reads `uploaded` and the server's queue pass
 * (superviseAnalysisQueue) queues it once Redis is back.
 */
export async function createCapture(
  userId: number,
  surveyId: number,
  fields: CreateCaptureFields,
  files: { file?: UploadedFile; reference?: UploadedFile },
  context: { storageDir: string; queue: AnalysisQueue },
): Promise<CaptureDto> {
  const newlyStored: string[] = []
  try {
    const { room } = await requireSurveyAccess(userId, surveyId, 'capture:create')
    if (!files.file) throw new ValidationError('Choose a WAV file to upload.', { file: 'Choose a WAV file to upload.' })
    if (files.file.size === 0) throw new ValidationError('The file is empty.', { file: 'The file is empty.' })
    const hasSweepParameters = fields.sweepF1Hz !== null && fields.sweepF2Hz !== null && fields.sweepDurationS !== null
    if (fields.kind === 'sweep' && !hasSweepParameters && !files.reference) {
      const message = 'A sweep recording needs its sweep parameters (f1, f2, duration) or a reference sweep file.'
      throw new ValidationError(message, { sweepF1Hz: message })
    }
    const facts = await wavFactsOfFile(files.file, 'file')
    if (fields.channel >= facts.channelCount) {
      const message = `Channel ${fields.channel} does not exist: the file has ${facts.channelCount} channel(s), numbered from 0.`
      throw new ValidationError(message, { channel: message })
    }
    if (files.reference) await wavFactsOfFile(files.reference, 'reference')
    const stored = await storeUploadedFile(context.storageDir, files.file.path)
    if (stored.isNew) newlyStored.push(stored.sha256)
    const reference = files.reference ? await storeUploadedFile(context.storageDir, files.reference.path) : null
    if (reference?.isNew) newlyStored.push(reference.sha256)
    // The capture and its first job record are written together: no capture is ever without one.
    const { capture, analysis } = await Capture.sequelize!.transaction(async (transaction) => {
      const created = await Capture.create(
        {
          ...fields,
          surveyId,
          uploadedById: userId,
          referenceSha256: reference?.sha256 ?? null,
          originalName: files.file!.originalname.slice(0, 255),
          sha256: stored.sha256,
          byteSize: files.file!.size,
          sampleRateHz: facts.sampleRateHz,
          bitDepth: facts.bitDepth,
          channelCount: facts.channelCount,
          durationS: facts.durationS,
        },
        { transaction },
      )
      const request = await recordAnalysisRequest(created.id, defaultSettingsOf(created), { transaction })
      return { capture: created, analysis: request.analysis }
    })
    newlyStored.length = 0
    await dispatchAnalysis(analysis, context.queue)
    await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.uploaded', summary: `uploaded ${capture.originalName} (${capture.receiverLabel || 'no position label'})` })
    return toCaptureDto(capture, captureViewOf([toStateRow(analysis)]))
  } catch (error) {
    await Promise.all(newlyStored.map((sha) => rm(contentPath(context.storageDir, sha), { force: true })))
    throw error
  } finally {
    await Promise.all([files.file, files.reference].filter(Boolean).map((f) => rm(f!.path, { force: true })))
  }
}

/** The settings of a capture's first analysis: the engine's defaults on the capture's channel. */
export function defaultSettingsOf(capture: Pick<Capture, 'channel'>): AnalysisSettings {
  return { ...DEFAULT_ANALYSIS_SETTINGS, channel: capture.channel }
}

/**
 * ORDER BY value of a headline column of the analysis a capture shows: its newest done analysis,
 * as deriveCaptureState picks it (shared/jobs/captureState.ts; a pin, when captures have one,
 * comes first there and must come first here).
 */
const shownHeadline = (column: string) =>
  literal(`(SELECT a.${column} FROM analyses a WHERE a.capture_id = "Capture"."id" AND a.status = 'done' ORDER BY a.finished_at DESC NULLS LAST, a.id DESC LIMIT 1)`)

const HEADLINE_COLUMNS = { T30: 'headline_t30_s', EDT: 'headline_edt_s', C80: 'headline_c80_db' } as const

function orderOf(sort: CaptureSortKey, order: 'asc' | 'desc'): OrderItem[] {
  const direction = order === 'asc' ? 'ASC' : 'DESC'
  const byId: OrderItem = ['id', 'ASC']
  switch (sort) {
    case 'uploaded':
      return [['id', direction]]
    case 'receiver':
      return [['receiverLabel', direction], byId]
    case 'source':
      return [['sourceLabel', direction], byId]
    case 'kind':
      return [['kind', direction], byId]
    default:
      return [[shownHeadline(HEADLINE_COLUMNS[sort]), `${direction} NULLS LAST`], byId]
  }
}

const HAS_DONE_ANALYSIS = `EXISTS (SELECT 1 FROM analyses a WHERE a.capture_id = "Capture"."id" AND a.status = 'done')`

/**
 * One page of a survey's captures, ordered on the server, each with its derived state and the
 * headline figures of the analysis it shows, read from columns: no analysis result is loaded.
 */
export async function listCaptures(userId: number, surveyId: number, query: ListCapturesQuery): Promise<CapturePageDto> {
  await requireSurveyAccess(userId, surveyId, 'room:read')
  const filters = query.analysed === undefined ? [] : [literal(query.analysed ? HAS_DONE_ANALYSIS : `NOT ${HAS_DONE_ANALYSIS}`)]
  const { rows, count } = await Capture.findAndCountAll({
    where: { surveyId, [Op.and]: filters },
    order: orderOf(query.sort, query.order),
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  })
  const views = await loadCaptureViews(rows)
  return { items: rows.map((capture) => toCaptureDto(capture, views.get(capture.id)!)), total: count, page: query.page, pageSize: query.pageSize }
}

/** One capture as the list and the live stream show it. */
export async function describeCapture(capture: Capture, override?: AnalysisStateRow): Promise<CaptureDto> {
  const views = await loadCaptureViews([capture], override)
  return toCaptureDto(capture, views.get(capture.id)!)
}

/** Loads a capture the caller may read; a capture in a room they cannot see is a 404. */
export async function requireCaptureAccess(userId: number, captureId: number) {
  const capture = await Capture.findByPk(captureId, { include: [{ association: 'survey' }] })
  if (!capture) throw new NotFoundError('That capture')
  const survey = (capture as Capture & { survey?: { roomId: number } }).survey
  try {
    const access = await requireRoomAccess(userId, survey!.roomId, 'room:read')
    return { capture, ...access }
  } catch (error) {
    if (error instanceof NotFoundError) throw new NotFoundError('That capture')
    throw error
  }
}

export async function getCapture(userId: number, captureId: number): Promise<CaptureDto> {
  const { capture } = await requireCaptureAccess(userId, captureId)
  return describeCapture(capture)
}

/** Owners and engineers delete any capture; a client only the ones they uploaded. */
export async function deleteCapture(userId: number, captureId: number, storageDir: string): Promise<void> {
  const { capture, role, isShared, room } = await requireCaptureAccess(userId, captureId)
  const mayDeleteAny = mayOnRoom(role, isShared, 'capture:delete-any')
  const mayDeleteOwn = mayOnRoom(role, isShared, 'capture:create') && capture.uploadedById === userId
  if (!mayDeleteAny && !mayDeleteOwn) throw new ForbiddenError('You may delete only captures you uploaded.')
  await capture.destroy()
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.deleted', summary: `deleted ${capture.originalName}` })
  const stillUsed = await Capture.count({ where: { sha256: capture.sha256 } })
  if (stillUsed === 0) await rm(contentPath(storageDir, capture.sha256), { force: true })
}

/** The analysis a capture shows (see deriveCaptureState), or the one asked for by id; only done ones. */
export async function getLatestAnalysis(userId: number, captureId: number, analysisId?: number): Promise<AnalysisDto> {
  const { capture } = await requireCaptureAccess(userId, captureId)
  const wantedId = analysisId ?? (await loadCaptureViews([capture])).get(capture.id)!.state.shownAnalysisId
  const analysis = wantedId === null ? null : await Analysis.findOne({ where: { id: wantedId, captureId, status: 'done' } })
  if (!analysis || !analysis.result) throw new NotFoundError('An analysis of that capture', 'analysis-not-ready')
  return {
    id: analysis.id,
    captureId,
    settingsKey: analysis.settingsKey,
    engineVersion: analysis.engineVersion ?? analysis.result.engineVersion,
    createdAt: analysis.createdAt.toISOString(),
    finishedAt: analysis.finishedAt?.toISOString() ?? null,
    result: analysis.result,
  }
}
