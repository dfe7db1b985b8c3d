import type { StorageEngine } from 'multer'
import { ContentMeter } from './contentMeter'
import { incomingKey } from './contentKeys'
import type { ObjectStore } from './createObjectStore'
import { HttpError } from '../errors'
import { logger } from '../logger'

/** A file of a multipart upload, streamed to a temporary object while it arrived. */
export interface IncomingUpload {
  fieldname: string
  originalname: string
  /** Temporary object holding the bytes until the capture is accepted (then removed). */
  tempKey: string
  size: number
  sha256: string
  /** The first bytes of the file (up to {@link HEADER_SPOOL_BYTES}), for the WAV header check. */
  headBytes: Uint8Array
}

/**
 * Bytes kept in memory per file for the header check. A WAV's fmt and data chunk headers sit in
 * its first few hundred bytes; 1 MiB leaves room for large metadata chunks before them.
 */
export const HEADER_SPOOL_BYTES = 1024 * 1024

/** The bucket could not take the upload (503: the request itself was fine). */
export class StorageUnavailableError extends HttpError {
  constructor() {
    super(503, 'storage-unavailable', 'The file store is not answering right now, so the upload was not kept. Try again in a minute.')
  }
}

/**
 * A multer storage engine that streams each file to a temporary object under `incoming/`,
 * hashing it on the way; nothing is written to the server's disk and at most the header spool
 * and lib-storage's part buffers are held in memory. Multer calls `_removeFile` for files of an
 * upload that fails later (a limit, a malformed body).
 */
export function incomingUploadStorage(store: ObjectStore): StorageEngine {
  return {
    _handleFile(_req, file, callback) {
      const tempKey = incomingKey()
      const meter = new ContentMeter(HEADER_SPOOL_BYTES)
      file.stream.on('error', (error) => meter.destroy(error))
      // Multer rejects a file over the size limit; stop sending the cut-off copy at once.
      file.stream.on('limit', () => meter.destroy(new Error('The file exceeded the upload limit.')))
      file.stream.pipe(meter)
      store.putStream(tempKey, meter, 'audio/wav').then(
        () => {
          const { sha256, byteSize, headBytes } = meter.result()
          callback(null, { tempKey, size: byteSize, sha256, headBytes } as Partial<Express.Multer.File>)
        },
        (error: unknown) => {
          // Errors of the request itself (a cut-off body, a limit) reach multer first; this one
          // only decides the answer when the bucket failed.
          const isRequestFailure = meter.destroyed
          meter.destroy()
          if (!isRequestFailure) logger.error({ err: error, tempKey }, 'could not store an upload')
          callback(new StorageUnavailableError())
        },
      )
    },
    _removeFile(_req, file, callback) {
      const { tempKey } = file as unknown as IncomingUpload
      store.remove([tempKey]).then(
        () => callback(null),
        (error: Error) => callback(error),
      )
    },
  }
}
