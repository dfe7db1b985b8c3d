import { basename, extname } from 'node:path'
import { HELP, parseUploadArgs, UsageError, type UploadOptions } from './upload/parseUploadArgs'
import { createRingdownClient, RequestFailedError, type RingdownClient } from './upload/ringdownClient'
import { uploadCapture, type UploadFile } from './upload/uploadCapture'
import { waitForAnalysis } from './upload/waitForAnalysis'
import { band1kHzOf, failureLines, formatUploadTable, type FileResult } from './upload/formatUploadResults'
import { createProgressReporter, type ProgressReporter } from './upload/progressReporter'
import type { SurveyDto } from '../shared/api/surveys'
import type { RoomDto } from '../shared/api/rooms'

const NAME = 'ringdown upload'

/** Checks the token and the survey once, before any upload: a bad token is one line, not one per file. */
async function checkSurvey(client: RingdownClient, surveyId: number): Promise<SurveyDto> {
  try {
    const survey = await client.getJson<SurveyDto>(`/api/surveys/${surveyId}`)
    const room = await client.getJson<RoomDto>(`/api/rooms/${survey.roomId}`)
    if (!room.permissions.canAddCaptures) {
      throw new RequestFailedError(`the token's role (${room.permissions.role}) may not add captures to survey ${surveyId}`, 403, 'forbidden')
    }
    return survey
  } catch (error) {
    if (!(error instanceof RequestFailedError)) throw error
    if (error.status === 401) throw new RequestFailedError(`the server refused the API token: ${error.message}`, 401, error.code)
    if (error.status === 404) throw new RequestFailedError(`survey ${surveyId} was not found in the token's workspace`, 404, error.code)
    throw error
  }
}

function fieldsFor(options: UploadOptions, file: string): Record<string, string> {
  const fields: Record<string, string> = {
    kind: options.kind,
    channel: String(options.channel),
    sourceLabel: options.sourceLabel,
    receiverLabel: options.receiverLabel ?? basename(file, extname(file)),
  }
  if (options.sweep) Object.assign(fields, { sweepF1Hz: String(options.sweep.f1Hz), sweepF2Hz: String(options.sweep.f2Hz), sweepDurationS: String(options.sweep.durationS) })
  return fields
}

async function uploadOne(client: RingdownClient, options: UploadOptions, file: string, progress: ProgressReporter): Promise<FileResult | number> {
  const files: UploadFile[] = [{ field: 'file', path: file }]
  if (options.referencePath) files.push({ field: 'reference', path: options.referencePath })
  try {
    const capture = await uploadCapture(client, options.surveyId, fieldsFor(options, file), files, (sent, total) => progress.uploading(file, sent, total))
    progress.note(file, `uploaded as capture ${capture.id}, ${capture.status}`)
    return capture.id
  } catch (error) {
    if (!(error instanceof RequestFailedError)) throw error
    return { file, captureId: null, status: 'failed', band1kHz: null, message: `upload refused: ${error.message}` }
  }
}

async function waitForOne(client: RingdownClient, options: UploadOptions, file: string, captureId: number, progress: ProgressReporter): Promise<FileResult> {
  let lastStatus = ''
  try {
    const outcome = await waitForAnalysis(client, captureId, {
      timeoutS: options.timeoutS,
      onStatus: (capture) => {
        if (capture.status !== lastStatus) progress.note(file, capture.status)
        lastStatus = capture.status
      },
    })
    if (outcome.status === 'done') return { file, captureId, status: 'done', band1kHz: band1kHzOf(outcome.analysis), message: null }
    return { file, captureId, status: outcome.status, band1kHz: null, message: `analysis ${outcome.status}: ${outcome.message}` }
  } catch (error) {
    if (!(error instanceof RequestFailedError)) throw error
    return { file, captureId, status: 'failed', band1kHz: null, message: `could not follow the analysis: ${error.message}` }
  }
}

/** Uploads every file first (the worker starts on each at once), then waits for each analysis in order. */
async function run(options: UploadOptions): Promise<FileResult[]> {
  const client = createRingdownClient(options.url, options.token)
  const progress = createProgressReporter(process.stderr)
  await checkSurvey(client, options.surveyId)
  const uploads: (FileResult | number)[] = []
  for (const file of options.files) uploads.push(await uploadOne(client, options, file, progress))
  const results: FileResult[] = []
  for (const [index, upload] of uploads.entries()) {
    results.push(typeof upload === 'number' ? await waitForOne(client, options, options.files[index]!, upload, progress) : upload)
  }
  return results
}

async function main(): Promise<number> {
  let options: UploadOptions | null
  try {
    options = parseUploadArgs(process.argv.slice(2), process.env)
  } catch (error) {
    if (!(error instanceof UsageError)) throw error
    process.stderr.write(`${NAME}: ${error.message} (see --help)\n`)
    return 2
  }
  if (!options) {
    process.stdout.write(`${HELP}\n`)
    return 0
  }
  try {
    const results = await run(options)
    process.stdout.write(`${options.isJson ? JSON.stringify(results, null, 2) : formatUploadTable(results)}\n`)
    const failures = failureLines(results)
    for (const line of failures) process.stderr.write(`${line}\n`)
    return failures.length > 0 ? 1 : 0
  } catch (error) {
    if (!(error instanceof RequestFailedError)) throw error
    process.stderr.write(`${NAME}: ${error.message}\n`)
    return 1
  }
}

main().then(
  (code) => {
    process.exitCode = code
  },
  (error: unknown) => {
    process.stderr.write(`${NAME}: unexpected error: ${(error as Error).message}\n`)
    process.exitCode = 1
  },
)
