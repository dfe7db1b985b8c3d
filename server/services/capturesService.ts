import { Analysis, Capture, Survey } from '../models'
import { ForbiddenError, NotFoundError, ValidationError } from '../errors'
import { requireSurveyAccess } from './surveysService'
import { requireRoomAccess } from '../policy/roomAccess'
import { mayOnRoom } from '../policy/policy'
import { commitUploads, discardUploads } from '../storage/commitUploads'
import { releaseQueuedContent } from '../storage/releaseContent'
import { HEADER_SPOOL_BYTES, type IncomingUpload } from '../storage/incomingUploadStorage'
import type { ObjectStore } from '../storage/createObjectStore'
import { findChunkStart } from '../../shared/acoustics/wav/findChunkStart'
import { readWavFacts } from '../../shared/acoustics/wav/readWavFacts'
import { checkReferenceSweep } from '../../shared/acoustics/sweep/checkReferenceSweep'
import { DspInputError } from '../../shared/acoustics/errors'
import { literal, Op, type OrderItem } from 'sequelize'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisDto, CaptureDto, CapturePageDto, CaptureSortKey, CreateCaptureFields, ListCapturesQuery } from '../../shared/api/captures'
import type { AnalysisSettings } from '../../shared/types/analysis'
import { DEFAULT_ANALYSIS_SETTINGS, keyToSettings } from '../../shared/jobs/analysisSettingsKey'
import { countingAnalyses, surveySettingsKeyFor, surveyAnalysisSettings } from './countingAnalyses'
import { noteReportChange } from './reportDrafts'
import { recordActivity } from './activityService'
import { dispatchAnalysis, recordAnalysisRequest } from './analysisJobsService'
import { captureViewOf, loadCaptureViews, toStateRow, type AnalysisStateRow, type CaptureView } from './captureStates'

/** An uploaded file as the upload middleware hands it over: in a temporary object, hashed. */
export type UploadedFile = IncomingUpload

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
    isExcluded: capture.excludedAt !== null,
    exclusionReason: capture.exclusionReason,
    excludedAt: capture.excludedAt?.toISOString() ?? null,
    pinnedAnalysisId: capture.pinnedAnalysisId,
    countingAnalysisId: view.countingAnalysisId,
    shownAnalysisId: view.state.shownAnalysisId,
    headline: view.headline,
    createdAt: capture.createdAt.toISOString(),
    updatedAt: capture.updatedAt.toISOString(),
  }
}

/**
 * The upload's WAV header facts, read from the first bytes kept while it streamed to storage
 * (the whole length is known by then, so a truncated data chunk is still caught).
 */
function wavFactsOfFile(file: UploadedFile, field: 'file' | 'reference') {
  const label = field === 'file' ? 'The file' : 'The reference sweep'
  try {
    return readWavFacts(file.headBytes, file.size)
  } catch (error) {
    if (!(error instanceof DspInputError)) throw error
    const isLittleEndian = String.fromCharCode(...file.headBytes.subarray(0, 4)) !== 'RIFX'
    if (file.size > HEADER_SPOOL_BYTES && findChunkStart(file.headBytes, 'data', isLittleEndian) === null) {
      const message = `its header chunks before the audio are larger than ${HEADER_SPOOL_BYTES / 1024 / 1024} MB (embedded pictures or notes); export the WAV without them.`
      throw new ValidationError(`${label}: ${message}`, { [field]: message })
    }
    throw new ValidationError(`${label}: ${error.message}`, { [field]: error.message })
  }
}

/** A reference sweep must match the recording (rate, length): the engine cannot tell otherwise. */
function checkReferenceAgainstRecording(recording: { sampleRateHz: number; frameCount: number }, reference: { sampleRateHz: number; frameCount: number }): void {
  try {
    checkReferenceSweep(recording, reference)
  } catch (error) {
    if (!(error instanceof DspInputError)) throw error
    throw new ValidationError(error.message, { reference: error.message })
  }
}

/** Control characters never belong in a displayed file name (a NUL is refused earlier). */
function cleanFileName(name: string): string {
  return name.replace(/[\u0000-\u001f\u007f]+/g, ' ').trim().slice(0, 255) || 'capture.wav'
}

/** Checks, before any byte is accepted, that the caller may add captures to the survey. */
export async function assertMayAddCapture(userId: number, surveyId: number): Promise<void> {
  await requireSurveyAccess(userId, surveyId, 'capture:create')
}

/**
 * Validates the uploaded WAV(s) (already streamed to temporary objects), stores them
 * content-addressed, writes the capture row with the job record of its first analysis (the
 * survey's settings) and enqueues it. On any failure nothing is left behind: temporary objects are
 * removed, and newly stored content is released again when its row could not be written. When
 * Redis is down the capture reads `uploaded` and the server's queue pass (superviseAnalysisQueue)
 * queues it once Redis is back.
 */
export async function createCapture(
  userId: number,
  surveyId: number,
  fields: CreateCaptureFields,
  files: { file?: UploadedFile; reference?: UploadedFile },
  context: { store: ObjectStore; queue: AnalysisQueue },
): Promise<CaptureDto> {
  try {
    const { room, survey } = await requireSurveyAccess(userId, surveyId, 'capture:create')
    if (!files.file) throw new ValidationError('Choose a WAV file to upload.', { file: 'Choose a WAV file to upload.' })
    if (files.file.size === 0) throw new ValidationError('The file is empty.', { file: 'The file is empty.' })
    const hasSweepParameters = fields.sweepF1Hz !== null && fields.sweepF2Hz !== null && fields.sweepDurationS !== null
    if (fields.kind === 'sweep' && !hasSweepParameters && !files.reference) {
      const message = 'A sweep recording needs its sweep parameters (f1, f2, duration) or a reference sweep file.'
      throw new ValidationError(message, { sweepF1Hz: message })
    }
    const facts = wavFactsOfFile(files.file, 'file')
    if (fields.channel >= facts.channelCount) {
      const message = `Channel ${fields.channel} does not exist: the file has ${facts.channelCount} channel(s), numbered from 0.`
      throw new ValidationError(message, { channel: message })
    }
    if (files.reference) checkReferenceAgainstRecording(facts, wavFactsOfFile(files.reference, 'reference'))
    if (fields.kind === 'sweep' && !files.reference && fields.sweepDurationS !== null && facts.durationS < fields.sweepDurationS) {
      const message = `The recording (${facts.durationS.toFixed(2)} s) is shorter than the sweep (${fields.sweepDurationS} s); record the whole sweep and the decay after it.`
      throw new ValidationError(message, { sweepDurationS: message })
    }
    const file = files.file
    const reference = files.reference
    // The capture and its first job record are written together: no capture is ever without one.
    const { capture, analysis } = await commitUploads(context.store, reference ? [file, reference] : [file], async (transaction) => {
      const created = await Capture.create(
        {
          ...fields,
          surveyId,
          uploadedById: userId,
          referenceSha256: reference?.sha256 ?? null,
          originalName: cleanFileName(file.originalname),
          sha256: file.sha256,
          byteSize: file.size,
          sampleRateHz: facts.sampleRateHz,
          bitDepth: facts.bitDepth,
          channelCount: facts.channelCount,
          durationS: facts.durationS,
        },
        { transaction },
      )
      const request = await recordAnalysisRequest(created.id, firstSettingsOf(created, survey), { transaction })
      return { capture: created, analysis: request.analysis }
    })
    await dispatchAnalysis(analysis, context.queue)
    await noteReportChange(room.id, surveyId, `New capture ${capture.receiverLabel || capture.originalName} uploaded`)
    await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.uploaded', summary: `uploaded ${capture.originalName} (${capture.receiverLabel || 'no position label'})` })
    return toCaptureDto(capture, captureViewOf([toStateRow(analysis)]))
  } catch (error) {
    await discardUploads(context.store, [files.file, files.reference])
    throw error
  }
}

/** The settings of a capture's first analysis: the engine's defaults on the capture's channel. */
export function defaultSettingsOf(capture: Pick<Capture, 'channel'>): AnalysisSettings {
  return { ...DEFAULT_ANALYSIS_SETTINGS, channel: capture.channel }
}

/** The settings a new capture of a survey is first analysed with: the survey's, on its channel. */
function firstSettingsOf(capture: Pick<Capture, 'channel'>, survey: Survey): AnalysisSettings {
  return keyToSettings(surveySettingsKeyFor(capture, surveyAnalysisSettings(survey)))
}

/**
 * Views of some captures of one survey: derived state, and the analysis shown — the one that
 * counts (countingAnalyses: pinned, or the default rule) when it exists, else the newest done.
 */
async function captureViews(captures: readonly Capture[], survey: Survey, override?: AnalysisStateRow): Promise<Map<number, CaptureView>> {
  const counting = await countingAnalyses(captures, survey, undefined, { withResult: false })
  return loadCaptureViews(captures.map((capture) => ({ id: capture.id, countingAnalysisId: counting.get(capture.id)?.id ?? null })), override)
}

/**
 * ORDER BY value of a headline column of the analysis a capture shows, close to what captureViews
 * picks: the pinned analysis first, else the newest done one (the default rule's choice among
 * several settings is not repeated in SQL; the survey's own settings usually have one row).
 */
const shownHeadline = (column: string) =>
  literal(`(SELECT a.${column} FROM analyses a WHERE a.capture_id = "Capture"."id" AND a.status = 'done' ORDER BY (a.id = "Capture"."pinned_analysis_id") DESC NULLS LAST, a.finished_at DESC NULLS LAST, a.id DESC LIMIT 1)`)

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
  const { survey } = await requireSurveyAccess(userId, surveyId, 'room:read')
  const filters = query.analysed === undefined ? [] : [literal(query.analysed ? HAS_DONE_ANALYSIS : `NOT ${HAS_DONE_ANALYSIS}`)]
  const { rows, count } = await Capture.findAndCountAll({
    where: { surveyId, [Op.and]: filters },
    order: orderOf(query.sort, query.order),
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  })
  const views = await captureViews(rows, survey)
  return { items: rows.map((capture) => toCaptureDto(capture, views.get(capture.id)!)), total: count, page: query.page, pageSize: query.pageSize }
}

/** One capture as the list and the live stream show it. */
export async function describeCapture(capture: Capture, override?: AnalysisStateRow): Promise<CaptureDto> {
  const views = await captureViews([capture], await surveyOf(capture), override)
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

/**
 * Owners and engineers delete any capture; a client only the ones they uploaded. Its stored files
 * (recording and reference sweep) are removed once no other row names the same content.
 */
export async function deleteCapture(userId: number, captureId: number, store: ObjectStore): Promise<void> {
  const { capture, role, isShared, room } = await requireCaptureAccess(userId, captureId)
  const mayDeleteAny = mayOnRoom(role, isShared, 'capture:delete-any')
  const mayDeleteOwn = mayOnRoom(role, isShared, 'capture:create') && capture.uploadedById === userId
  if (!mayDeleteAny && !mayDeleteOwn) throw new ForbiddenError('You may delete only captures you uploaded.')
  await capture.destroy()
  await noteReportChange(room.id, capture.surveyId, `Capture ${capture.receiverLabel || capture.originalName} deleted`)
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.deleted', summary: `deleted ${capture.originalName}` })
  await releaseQueuedContent(store)
}

async function surveyOf(capture: Capture): Promise<Survey> {
  return (capture as Capture & { survey?: Survey }).survey ?? (await Survey.findByPk(capture.surveyId))!
}

/**
 * The analysis a capture page opens on and its exports use: the one asked for by id, else the one
 * the capture shows (the counting one — pinned, or the default rule — else its newest done one);
 * only finished analyses.
 */
export async function getLatestAnalysis(userId: number, captureId: number, analysisId?: number): Promise<AnalysisDto> {
  const { capture } = await requireCaptureAccess(userId, captureId)
  const view = (await captureViews([capture], await surveyOf(capture))).get(capture.id)!
  const wantedId = analysisId ?? view.state.shownAnalysisId
  const analysis = wantedId === null ? null : await Analysis.findOne({ where: { id: wantedId, captureId, status: 'done' } })
  if (!analysis || !analysis.result) throw new NotFoundError('An analysis of that capture', 'analysis-not-ready')
  return {
    id: analysis.id,
    captureId,
    settingsKey: analysis.settingsKey,
    engineVersion: analysis.engineVersion ?? analysis.result.engineVersion,
    createdAt: analysis.createdAt.toISOString(),
    isCounting: analysis.id === view.countingAnalysisId,
    isPinned: analysis.id === capture.pinnedAnalysisId,
    finishedAt: analysis.finishedAt?.toISOString() ?? null,
    result: analysis.result,
  }
}
