import multer from 'multer'
import type { RequestHandler } from 'express'
import { HttpError, ValidationError } from '../errors'
import { incomingUploadStorage } from '../storage/incomingUploadStorage'
import type { ObjectStore } from '../storage/createObjectStore'

/** Busboy's own errors are about the request body, never about the server (400, not 500). */
class MalformedUploadError extends HttpError {
  constructor(detail: string) {
    super(400, 'bad-multipart', `The upload is not a complete multipart/form-data request (${detail}). Send the form again; if you build the request yourself, give the boundary in Content-Type and end the body with the closing boundary.`)
  }
}

function isNamed(value: unknown): value is { name: string } {
  return typeof value === 'object' && value !== null && typeof (value as { name?: unknown }).name === 'string'
}

/** Multer's limit errors and our HttpErrors pass through; any other parser error is the body's fault. */
function toUploadError(error: unknown): unknown {
  if (error instanceof HttpError || (isNamed(error) && error.name === 'MulterError')) return error
  const message = error instanceof Error ? error.message : String(error)
  return new MalformedUploadError(message.replace(/\.$/, ''))
}

/**
 * Multipart upload streamed into object storage as it arrives (see incomingUploadStorage):
 * fields `file` (the capture) and optional `reference` (the reference sweep). A file name with a
 * NUL byte is refused before any byte is stored; multer removes stored files itself when a later
 * part fails, and the capture service removes the rest.
 */
export function captureUpload(store: ObjectStore, limitMb: number): RequestHandler {
  const handle = multer({
    storage: incomingUploadStorage(store),
    limits: { fileSize: Math.round(limitMb * 1024 * 1024), files: 2, fields: 30, fieldSize: 10_000, parts: 40 },
    fileFilter: (_req, file, accept) => {
      if (file.originalname.includes('\u0000')) {
        const message = 'The file name contains a NUL character. Rename the file and upload it again.'
        accept(new ValidationError(message, { [file.fieldname]: message }))
        return
      }
      accept(null, true)
    },
  }).fields([
    { name: 'file', maxCount: 1 },
    { name: 'reference', maxCount: 1 },
  ])
  return (req, res, next) => handle(req, res, (error?: unknown) => next(error === undefined ? undefined : toUploadError(error)))
}
