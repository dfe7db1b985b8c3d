import type { CaptureStatus } from '@shared/jobs/analysisJob'

export const CAPTURE_STATUS_LABELS: Record<CaptureStatus, string> = {
  uploaded: 'Waiting for the queue',
  queued: 'Queued',
  analysing: 'Analysing',
  done: 'Done',
  failed: 'Failed',
}

export const CAPTURE_STATUS_COLORS: Record<CaptureStatus, string> = {
  uploaded: 'secondary',
  queued: 'secondary',
  analysing: 'primary',
  done: 'success',
  failed: 'error',
}

/** What to do about a failed capture, from the worker's message (worded by the engine's checks). */
export function failedCaptureAdvice(statusMessage: string | null): string {
  const message = statusMessage ?? ''
  if (/8-bit|bit PCM|format code|compressed/i.test(message)) return 'Export the recording again as 24-bit PCM WAV, then delete this capture and upload the new file.'
  if (/sweep|reference/i.test(message)) return 'Upload the file again as a sweep with its start and end frequency and length, or with the reference sweep file.'
  if (/silen|no decay|too short|empty/i.test(message)) return 'Check that the recording holds the sound and the decay after it (leave a few seconds of silence), then upload it again.'
  if (/clip/i.test(message)) return 'Record again with less gain so the peak stays below full scale.'
  return 'Check the recording, then delete this capture and upload the file again. If it keeps failing, export it as 24-bit PCM WAV.'
}

/** One line for a pending capture, so a long wait does not look stuck. */
export function pendingCaptureText(status: CaptureStatus): string | null {
  if (status === 'uploaded') return 'Accepted; the analysis starts when the queue is back.'
  if (status === 'queued') return 'Waiting for a worker.'
  if (status === 'analysing') return 'The worker is analysing it.'
  return null
}
