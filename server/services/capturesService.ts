import { readFile, rm } from 'node:fs/promises'
import { Analysis, Capture, Survey } from '../models'
import { ForbiddenError, NotFoundError, ValidationError } from '../errors'
import { requireSurveyAccess } from './surveysService'
import { requireRoomAccess } from '../policy/roomAccess'
import { mayOnRoom } from '../policy/policy'
import { storeUploadedFile } from '../storage/storeUploadedFile'
import { contentPath } from '../storage/contentPath'
import { readWavFacts } from '../../shared/acoustics/wav/readWavFacts'
import { DspInputError } from '../../shared/acoustics/errors'
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisDto, CaptureDto, CaptureHeadline, CreateCaptureFields } from '../../shared/api/captures'
import type { AnalysisResult } from '../../shared/types/analysis'
import { DEFAULT_ANALYSIS_SETTINGS, settingsToKey } from '../../shared/jobs/analysisSettingsKey'
import { countingAnalyses, surveySettingsKeyFor, surveyAnalysisSettings } from './countingAnalyses'
import { noteReportChange } from './reportDrafts'
import { logger } from '../logger'
import { recordActivity } from './activityService'

export interface UploadedFile {
  path: string
  originalname: string
  size: number
}

export function toCaptureDto(capture: Capture): CaptureDto {
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
    status: capture.status,
    statusMessage: capture.statusMessage,
    isExcluded: capture.excludedAt !== null,
    exclusionReason: capture.exclusionReason,
    excludedAt: capture.excludedAt?.toISOString() ?? null,
    pinnedAnalysisId: capture.pinnedAnalysisId,
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
 * Validates the uploaded WAV(s), stores them content-addressed, writes the capture row and enqueues
 * its analysis. On any failure nothing is left behind: temporary files are removed, and a newly
 * stored file is removed again when its row could not be written. When Redis is down the capture
 * stays `uploaded` and {@link requeueUploadedCaptures} queues it once Redis is back.
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
    const { room, survey } = await requireSurveyAccess(userId, surveyId, 'capture:create')
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
    const capture = await Capture.create({
      ...fields,
      surveyId,
      uploadedById: userId,
      referenceSha256: reference?.sha256 ?? null,
      originalName: files.file.originalname.slice(0, 255),
      sha256: stored.sha256,
      byteSize: files.file.size,
      sampleRateHz: facts.sampleRateHz,
      bitDepth: facts.bitDepth,
      channelCount: facts.channelCount,
      durationS: facts.durationS,
      status: 'uploaded',
      statusMessage: 'Waiting for the queue',
    })
    newlyStored.length = 0
    await enqueueCapture(capture, context.queue, surveySettingsKeyFor(capture, surveyAnalysisSettings(survey)))
    await noteReportChange(room.id, surveyId, `New capture ${capture.receiverLabel || capture.originalName} uploaded`)
    await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.uploaded', summary: `uploaded ${capture.originalName} (${capture.receiverLabel || 'no position label'})` })
    return toCaptureDto(capture)
  } catch (error) {
    await Promise.all(newlyStored.map((sha) => rm(contentPath(context.storageDir, sha), { force: true })))
    throw error
  } finally {
    await Promise.all([files.file, files.reference].filter(Boolean).map((f) => rm(f!.path, { force: true })))
  }
}

/** Enqueues the default analysis; a Redis outage leaves the capture `uploaded` for the requeue loop. */
export async function enqueueCapture(capture: Capture, queue: AnalysisQueue, settingsKey = settingsToKey({ ...DEFAULT_ANALYSIS_SETTINGS, channel: capture.channel })): Promise<void> {
  try {
    await queue.enqueue({ captureId: capture.id, settingsKey })
    await capture.update({ status: 'queued', statusMessage: 'Waiting for a worker' })
  } catch (error) {
    logger.warn({ err: error, captureId: capture.id }, 'could not enqueue; will retry')
  }
}

/** Queues every capture still `uploaded` (e.g. accepted while Redis was down). Returns how many. */
export async function requeueUploadedCaptures(queue: AnalysisQueue): Promise<number> {
  const waiting = await Capture.findAll({ where: { status: 'uploaded' }, limit: 100, order: [['id', 'ASC']] })
  for (const capture of waiting) await enqueueCapture(capture, queue)
  return waiting.filter((c) => c.status === 'queued').length
}

/** Mid-band (500 Hz and 1 kHz octaves, or the thirds 400 Hz–1.25 kHz) mean of a parameter. */
function midBand(result: AnalysisResult, parameter: 'T30' | 'T20' | 'EDT' | 'C80'): number | null {
  const values = result.bands
    .filter((band) => band.centreHz >= 355 && band.centreHz <= 1413)
    .map((band) => band[parameter])
    .filter((value): value is number => value !== null)
  return values.length === 0 ? null : values.reduce((sum, value) => sum + value, 0) / values.length
}

export function headlineOf(result: AnalysisResult | undefined): CaptureHeadline | null {
  if (!result) return null
  return { T30S: midBand(result, 'T30'), T20S: midBand(result, 'T20'), EDTS: midBand(result, 'EDT'), C80Db: midBand(result, 'C80') }
}

export async function listCaptures(userId: number, surveyId: number): Promise<CaptureDto[]> {
  const { survey } = await requireSurveyAccess(userId, surveyId, 'room:read')
  const captures = await Capture.findAll({ where: { surveyId }, order: [['id', 'ASC']] })
  const analyses = await countingAnalyses(captures, survey)
  return captures.map((capture) => ({ ...toCaptureDto(capture), countingAnalysisId: analyses.get(capture.id)?.id ?? null, headline: headlineOf(analyses.get(capture.id)?.result) }))
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
  const analysis = (await countingAnalyses([capture], await surveyOf(capture))).get(capture.id)
  return { ...toCaptureDto(capture), countingAnalysisId: analysis?.id ?? null, headline: headlineOf(analysis?.result) }
}

/** Owners and engineers delete any capture; a client only the ones they uploaded. */
export async function deleteCapture(userId: number, captureId: number, storageDir: string): Promise<void> {
  const { capture, role, isShared, room } = await requireCaptureAccess(userId, captureId)
  const mayDeleteAny = mayOnRoom(role, isShared, 'capture:delete-any')
  const mayDeleteOwn = mayOnRoom(role, isShared, 'capture:create') && capture.uploadedById === userId
  if (!mayDeleteAny && !mayDeleteOwn) throw new ForbiddenError('You may delete only captures you uploaded.')
  await capture.destroy()
  await noteReportChange(room.id, capture.surveyId, `Capture ${capture.receiverLabel || capture.originalName} deleted`)
  await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.deleted', summary: `deleted ${capture.originalName}` })
  const stillUsed = await Capture.count({ where: { sha256: capture.sha256 } })
  if (stillUsed === 0) await rm(contentPath(storageDir, capture.sha256), { force: true })
}

async function surveyOf(capture: Capture): Promise<Survey> {
  return (capture as Capture & { survey?: Survey }).survey ?? (await Survey.findByPk(capture.surveyId))!
}

/**
 * The analysis a capture page opens on and its exports use: the one asked for by id, else the one
 * that counts (pinned, or the default rule), else — before any analysis with the survey's
 * settings exists — the newest, marked as not counting.
 */
export async function getLatestAnalysis(userId: number, captureId: number, analysisId?: number): Promise<AnalysisDto> {
  const { capture } = await requireCaptureAccess(userId, captureId)
  const counting = (await countingAnalyses([capture], await surveyOf(capture), undefined, { withResult: false })).get(capture.id)
  const wantedId = analysisId ?? counting?.id
  const analysis = await Analysis.findOne({ where: { captureId, ...(wantedId ? { id: wantedId } : {}) }, order: [['updatedAt', 'DESC']] })
  if (!analysis) throw new NotFoundError('An analysis of that capture', 'analysis-not-ready')
  return {
    id: analysis.id,
    captureId,
    settingsKey: analysis.settingsKey,
    engineVersion: analysis.engineVersion,
    createdAt: analysis.createdAt.toISOString(),
    isCounting: analysis.id === counting?.id,
    isPinned: analysis.id === capture.pinnedAnalysisId,
    result: analysis.result,
  }
}
