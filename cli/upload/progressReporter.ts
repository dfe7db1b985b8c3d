import { basename } from 'node:path'

export interface ProgressReporter {
  uploading: (file: string, sentBytes: number, totalBytes: number) => void
  /** A line that stays: uploaded, a status change, done. */
  note: (file: string, text: string) => void
}

const megabytes = (bytes: number) => `${(bytes / 1_048_576).toFixed(1)} MB`

/**
 * Progress on standard error. On a terminal the upload line updates in place; in a log (no
 * terminal) it is written at every quarter, so a rig's log still shows where a run stopped.
 */
export function createProgressReporter(stream: NodeJS.WriteStream): ProgressReporter {
  const isLive = Boolean(stream.isTTY)
  const quartersShown = new Map<string, number>()
  let hasOpenLine = false
  const closeLine = () => {
    if (hasOpenLine) stream.write('\n')
    hasOpenLine = false
  }
  return {
    uploading(file, sentBytes, totalBytes) {
      const percent = totalBytes === 0 ? 100 : Math.floor((100 * sentBytes) / totalBytes)
      const text = `${basename(file)}: uploading ${percent}% (${megabytes(sentBytes)} of ${megabytes(totalBytes)})`
      if (isLive) {
        stream.write(`\r${text}\x1b[K`)
        hasOpenLine = true
        return
      }
      const quarter = Math.floor(percent / 25)
      if ((quartersShown.get(file) ?? -1) < quarter) {
        quartersShown.set(file, quarter)
        stream.write(`${text}\n`)
      }
    },
    note(file, text) {
      closeLine()
      stream.write(`${basename(file)}: ${text}\n`)
    },
  }
}
