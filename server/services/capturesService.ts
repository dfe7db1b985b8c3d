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
import type { AnalysisQueue } from '../queue/analysisQueue'
import type { AnalysisDto, CaptureDto, CaptureHeadline, CreateCaptureFields } from '../../shared/api/captures'
import type { AnalysisResult } from '../../shared/types/analysis'
import { DEFAULT_ANALYSIS_SETTINGS, settingsToKey } from '../../shared/jobs/analysisSettingsKey'
import { countingAnalyses, surveySettingsKeyFor, surveyAnalysisSettings } from './countingAnalyses'
import { noteReportChange } from './reportDrafts'
import { logger } from '../logger'
import { recordActivity } from './activityService'

/** An uploaded file as the upload middleware hands it over: in a temporary object, hashed. */
export type UploadedFile = IncomingUpload

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
 * content-addressed, writes the capture row and enqueues its analysis. On any failure nothing is
 * left behind: temporary objects are removed, and newly stored content is released again when its
 * row could not be written. When Redis is down the capture stays `uploaded` and
 * {@link requeueUploadedCaptures} queues it once Redis is back.
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
    const capture = await commitUploads(context.store, reference ? [file, reference] : [file], (transaction) =>
      Capture.create(
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
          status: 'uploaded',
          statusMessage: 'Waiting for the queue',
        },
        { transaction },
      ),
    )
    await enqueueCapture(capture, context.queue, surveySettingsKeyFor(capture, surveyAnalysisSettings(survey)))
    await noteReportChange(room.id, surveyId, `New capture ${capture.receiverLabel || capture.originalName} uploaded`)
    await recordActivity({ workspaceId: room.workspaceId, roomId: room.id, userId, action: 'capture.uploaded', summary: `uploaded ${capture.originalName} (${capture.receiverLabel || 'no position label'})` })
    return toCaptureDto(capture)
  } catch (error) {
    await discardUploads(context.store, [files.file, files.reference])
    throw error
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
