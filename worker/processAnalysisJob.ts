import { UnrecoverableError, type Job } from 'bullmq'
import { Analysis, Capture } from '../server/models'
import { ObjectNotFoundError, type ObjectStore } from '../server/storage/createObjectStore'
import { readContent } from '../server/storage/readContent'
import { decodeWav } from '../shared/acoustics/wav/decodeWav'
import { analyseCapture } from '../shared/acoustics/analyseCapture'
import { DspInputError } from '../shared/acoustics/errors'
import type { AnalysisJobPayload } from '../shared/jobs/analysisJob'
import { keyToSettings, settingsToKey } from '../shared/jobs/analysisSettingsKey'

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

/**
 * Loads the capture's file, decodes it, runs the acoustics pipeline and stores the result once per
 * (capture, settings). Bad audio fails at once (no retry); anything else is retried by BullMQ and
 * marks the capture failed only after the last attempt.
 */
export async function processAnalysisJob(job: ProgressJob, context: ProcessorContext): Promise<{ analysisId: number }> {
  const capture = await Capture.findByPk(job.data.captureId)
  if (!capture) throw new UnrecoverableError(`Capture ${job.data.captureId} no longer exists.`)
  const settings = keyToSettings(job.data.settingsKey)
  try {
    await capture.update({ status: 'analysing', statusMessage: 'Reading the file' })
    await job.updateProgress({ stage: 'decoding', percent: 10 })
    const decoded = decodeWav(await readStored(context.store, capture.sha256), { channel: settings.channel })
    const referenceSweep = capture.referenceSha256
      ? decodeWav(await readStored(context.store, capture.referenceSha256), { channel: 0 }).samples
      : undefined
    await capture.update({ statusMessage: 'Analysing bands' })
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
    result.warnings.push(...decoded.warnings)
    await job.updateProgress({ stage: 'storing', percent: 90 })
    const settingsKey = settingsToKey(settings)
    const [analysis] = await Analysis.upsert(
      { captureId: capture.id, settingsKey, engineVersion: result.engineVersion, result },
      { conflictFields: ['capture_id', 'settings_key'] as never },
    )
    await capture.update({ status: 'done', statusMessage: null })
    await job.updateProgress({ stage: 'done', percent: 100 })
    return { analysisId: analysis.id }
  } catch (error) {
    const isBadInput = error instanceof DspInputError || error instanceof UnrecoverableError
    const isLastAttempt = job.attemptsMade + 1 >= (job.opts.attempts ?? 1)
    if (isBadInput || isLastAttempt) {
      await capture.update({ status: 'failed', statusMessage: (error as Error).message })
    }
    if (error instanceof DspInputError) throw new UnrecoverableError(error.message)
    throw error
  }
}
