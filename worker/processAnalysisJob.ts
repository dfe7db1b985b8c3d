import { UnrecoverableError, type Job } from 'bullmq'
import { Capture } from '../server/models'
import { ObjectNotFoundError, type ObjectStore } from '../server/storage/createObjectStore'
import { readContent } from '../server/storage/readContent'
import { decodeWav } from '../shared/acoustics/wav/decodeWav'
import { analyseCapture } from '../shared/acoustics/analyseCapture'
import { DspInputError } from '../shared/acoustics/errors'
import type { AnalysisJobPayload } from '../shared/jobs/analysisJob'
import { analysisIdOf, claimAnalysis, recordFailure, recordResult, recordStage } from './analysisRecord'
import { logger } from '../server/logger'

export interface ProcessorContext {
  /** The bucket the server stores uploads in: the worker reads nothing from a local disk. */
  store: ObjectStore
}

type ProgressJob = Pick<Job<AnalysisJobPayload>, 'data' | 'attemptsMade' | 'opts' | 'updateProgress'>

/** A missing object will not appear by retrying; a storage outage will pass, so it is retried. */
async function readStored(store: ObjectStore, sha256: string): Promise<Uint8Array> {
  try {
    return await readContent(store, sha256)
  } catch (error) {
    if (error instanceof ObjectNotFoundError) throw new UnrecoverableError('The stored file is missing. Upload the capture again.')
    throw error
  }
}

async function captureOf(captureId: number): Promise<Capture> {
  const capture = await Capture.findByPk(captureId)
  if (!capture) throw new UnrecoverableError(`Capture ${captureId} no longer exists.`)
  return capture
}

/**
 * Runs the analysis its job names: claims the analysis row, loads the capture's file, decodes it,
 * runs the acoustics pipeline and stores the result in that row. Bad audio fails at once (no
 * retry); anything else is retried by BullMQ and marks the row failed only after the last attempt.
 * The capture row is never written: its state is derived from its analyses.
 */
export async function processAnalysisJob(job: ProgressJob, context: ProcessorContext): Promise<{ analysisId: number }> {
  const analysisId = await analysisIdOf(job.data, async () => (await captureOf(job.data.captureId)).channel)
  const analysis = await claimAnalysis(analysisId)
  if (!analysis) return { analysisId } // already done (a repeated delivery), or the capture was deleted
  try {
    const capture = await captureOf(analysis.captureId)
    const settings = analysis.settings
    await job.updateProgress({ stage: 'decoding', percent: 10 })
    const decoded = decodeWav(await readStored(context.store, capture.sha256), { channel: settings.channel })
    const referenceSweep = capture.referenceSha256
      ? decodeWav(await readStored(context.store, capture.referenceSha256), { channel: 0 }).samples
      : undefined
    await recordStage(analysis, 'Analysing bands')
    await job.updateProgress({ stage: 'analysing', percent: 30 })
    const result = analyseCapture(decoded.samples, {
      sampleRateHz: decoded.sampleRateHz,
      kind: capture.kind,
      settings,
      ...(capture.kind === 'sweep' && capture.sweepF1Hz && capture.sweepF2Hz && capture.sweepDurationS
        ? { sweep: { f1Hz: capture.sweepF1Hz, f2Hz: capture.sweepF2Hz, durationS: capture.sweepDurationS } }
        : {}),
      ...(referenceSweep ? { referenceSweep } : {}),
    })
    for (const warning of decoded.warnings) result.warnings.push(warning)
    await job.updateProgress({ stage: 'storing', percent: 90 })
    await recordResult(analysis, result)
    await job.updateProgress({ stage: 'done', percent: 100 })
    return { analysisId: analysis.id }
  } catch (error) {
    const isBadInput = error instanceof DspInputError || error instanceof UnrecoverableError
    const isLastAttempt = job.attemptsMade + 1 >= (job.opts.attempts ?? 1)
    // When even this write fails (database away), the server's queue pass settles the row later.
    await recordFailure(analysis, (error as Error).message, { isFinal: isBadInput || isLastAttempt }).catch((writeError: unknown) =>
      logger.warn({ err: writeError, analysisId }, 'could not record the failure'),
    )
    if (error instanceof DspInputError) throw new UnrecoverableError(error.message)
    throw error
  }
}
