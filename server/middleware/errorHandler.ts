import type { ErrorRequestHandler, RequestHandler } from 'express'
import { HttpError, NotFoundError } from '../errors'
import { logger } from '../logger'

interface ErrorWithStatus {
  status?: number
  statusCode?: number
  code?: string
  type?: string
  expose?: boolean
  message?: string
}

/** Errors raised by middleware we use (body-parser, csrf-sync, multer) that carry a 4xx status. */
function fromLibraryError(error: ErrorWithStatus & { name?: string; field?: string }): HttpError | null {
  if (error.name === 'MulterError') {
    if (error.code === 'LIMIT_FILE_SIZE') return new HttpError(413, 'too-large', 'The file is larger than the upload limit. Trim the silence at its end or export a shorter file.')
    return new HttpError(400, 'bad-upload', `The upload was not accepted (${error.message}). Send one WAV as "file" and optionally one as "reference".`)
  }
  if (error.code === 'EBADCSRFTOKEN') {
    return new HttpError(403, 'csrf', 'Your session token is missing or out of date. Reload the page and try again.')
  }
  if (error.type === 'entity.parse.failed') return new HttpError(400, 'invalid-json', 'The request body is not valid JSON.')
  if (error.type === 'entity.too.large') return new HttpError(413, 'too-large', 'The request body is too large.')
  const status = error.status ?? error.statusCode
  if (status && status >= 400 && status < 500 && error.expose !== false) {
    return new HttpError(status, error.code ?? 'bad-request', error.message ?? 'The request could not be handled.')
  }
  return null
}

export const notFoundHandler: RequestHandler = () => {
  throw new NotFoundError('That API route')
}

/** Maps every error to `{ error: { code, message, fields? } }`; unexpected ones are logged 500s. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const known = error instanceof HttpError ? error : fromLibraryError(error as ErrorWithStatus)
  if (known) {
    res.status(known.status).json({ error: { code: known.code, message: known.message, ...(known.fields ? { fields: known.fields } : {}) } })
    return
  }
  logger.error({ err: error, method: req.method, url: req.originalUrl }, 'unhandled error')
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side. Try again; if it keeps happening, tell us.' } })
}
