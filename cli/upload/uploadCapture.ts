import { createReadStream } from 'node:fs'
import { stat } from 'node:fs/promises'
import { basename } from 'node:path'
import { randomBytes } from 'node:crypto'
import { Readable } from 'node:stream'
import { failureOf, networkFailure, RequestFailedError, type RingdownClient } from './ringdownClient'
import type { CaptureDto } from '../../shared/api/captures'

export interface UploadFile {
  field: 'file' | 'reference'
  path: string
}

/** Called as bytes leave: how many of the file so far, and of how many. */
export type UploadProgress = (sentBytes: number, totalBytes: number) => void

function escapeQuoted(value: string): string {
  return value.replace(/["\r\n\\]/g, '_')
}

/**
 * The multipart body as a stream: text fields, then each file read in chunks (never whole in
 * memory). Reports the bytes of the files as they are handed to the connection.
 */
async function* multipartBody(boundary: string, fields: Record<string, string>, files: UploadFile[], onFileBytes: (bytes: number) => void): AsyncGenerator<Uint8Array> {
  const encoder = new TextEncoder()
  for (const [name, value] of Object.entries(fields)) {
    yield encoder.encode(`--${boundary}\r\nContent-Disposition: form-data; name="${name}"\r\n\r\n${value}\r\n`)
  }
  for (const file of files) {
    yield encoder.encode(`--${boundary}\r\nContent-Disposition: form-data; name="${file.field}"; filename="${escapeQuoted(basename(file.path))}"\r\nContent-Type: audio/wav\r\n\r\n`)
    for await (const chunk of createReadStream(file.path, { highWaterMark: 256 * 1024 })) {
      onFileBytes((chunk as Buffer).length)
      yield chunk as Buffer
    }
    yield encoder.encode('\r\n')
  }
  yield encoder.encode(`--${boundary}--\r\n`)
}

/** POSTs one capture to a survey as multipart/form-data; answers the created capture (status queued). */
export async function uploadCapture(client: RingdownClient, surveyId: number, fields: Record<string, string>, files: UploadFile[], onProgress: UploadProgress): Promise<CaptureDto> {
  const sizes = await Promise.all(files.map(async (file) => {
    try {
      return (await stat(file.path)).size
    } catch (error) {
      throw new RequestFailedError(`cannot read ${file.path} (${(error as NodeJS.ErrnoException).code ?? 'read error'})`, null, null)
    }
  }))
  const totalBytes = sizes.reduce((sum, size) => sum + size, 0)
  let sentBytes = 0
  const boundary = `ringdown-${randomBytes(12).toString('hex')}`
  const body = multipartBody(boundary, fields, files, (bytes) => {
    sentBytes += bytes
    onProgress(sentBytes, totalBytes)
  })
  let response: Response
  try {
    response = await fetch(`${client.baseUrl}/api/surveys/${surveyId}/captures`, {
      method: 'POST',
      headers: { authorization: `Bearer ${client.token}`, 'content-type': `multipart/form-data; boundary=${boundary}`, accept: 'application/json' },
      body: Readable.toWeb(Readable.from(body)) as ReadableStream<Uint8Array>,
      // Node's fetch streams a request body only in half-duplex mode.
      duplex: 'half',
    } as RequestInit)
  } catch (error) {
    throw networkFailure(client.baseUrl, error)
  }
  if (!response.ok) throw await failureOf(response)
  return (await response.json()) as CaptureDto
}
