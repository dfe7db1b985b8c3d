import type { Readable } from 'node:stream'
import {
  AbortMultipartUploadCommand,
  CopyObjectCommand,
  CreateBucketCommand,
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  ListMultipartUploadsCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
  paginateListObjectsV2,
} from '@aws-sdk/client-s3'
import { Upload } from '@aws-sdk/lib-storage'
import type { AppConfig } from '../config'

export interface StoredObjectInfo {
  key: string
  byteSize: number
  lastModified: Date
}

/** Thrown by {@link ObjectStore.getStream} for a key the bucket does not hold. */
export class ObjectNotFoundError extends Error {
  constructor(readonly key: string) {
    super(`No stored object ${key}`)
    this.name = 'ObjectNotFoundError'
  }
}

/** The bucket operations Ringdown uses; the product always talks the S3 API. */
export type ObjectStore = ReturnType<typeof createObjectStore>

// lib-storage holds at most queueSize × partSize bytes of an upload in memory (its docs): 2 × 5 MiB.
const UPLOAD_PART_BYTES = 5 * 1024 * 1024
const UPLOAD_QUEUE_SIZE = 2
/** DeleteObjects takes at most 1000 keys per request (S3 API reference). */
const DELETE_BATCH = 1000

function isNotFound(error: unknown): boolean {
  if (!(error instanceof S3ServiceException)) return false
  return error.name === 'NotFound' || error.name === 'NoSuchKey' || error.$metadata.httpStatusCode === 404
}

export function createS3Client(config: Pick<AppConfig, 'S3_ENDPOINT' | 'S3_REGION' | 'S3_FORCE_PATH_STYLE'>): S3Client {
  return new S3Client({
    region: config.S3_REGION,
    ...(config.S3_ENDPOINT ? { endpoint: config.S3_ENDPOINT } : {}),
    forcePathStyle: config.S3_FORCE_PATH_STYLE ? config.S3_FORCE_PATH_STYLE === '1' : Boolean(config.S3_ENDPOINT),
    // Checksums only where the API requires them: compatible servers differ in the newer
    // flexible-checksum headers, and every object is already addressed by its sha256.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  })
}

/**
 * Object storage on one bucket (S3_BUCKET at S3_ENDPOINT). Credentials come from the SDK's
 * default chain. Uploads stream through lib-storage's multipart upload with bounded memory.
 */
export function createObjectStore(config: Pick<AppConfig, 'S3_ENDPOINT' | 'S3_REGION' | 'S3_FORCE_PATH_STYLE' | 'S3_BUCKET'>, client = createS3Client(config)) {
  const Bucket = config.S3_BUCKET
  return {
    bucket: Bucket,
    client,

    /** Creates the bucket when it does not exist yet (the start command's fake, tests). */
    async ensureBucket(): Promise<void> {
      try {
        await client.send(new HeadBucketCommand({ Bucket }))
      } catch (error) {
        if (!isNotFound(error)) throw error
        await client.send(new CreateBucketCommand({ Bucket }))
      }
    },

    /** Streams `body` into `key`; on any error nothing is left under that key. */
    async putStream(key: string, body: Readable, contentType = 'application/octet-stream'): Promise<void> {
      const upload = new Upload({ client, params: { Bucket, Key: key, Body: body, ContentType: contentType }, partSize: UPLOAD_PART_BYTES, queueSize: UPLOAD_QUEUE_SIZE })
      await upload.done()
    },

    async putBytes(key: string, bytes: Uint8Array, contentType = 'application/octet-stream'): Promise<void> {
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: bytes, ContentType: contentType }))
    },

    /** The object's bytes as a stream, with its size. @throws ObjectNotFoundError */
    async getStream(key: string): Promise<{ body: Readable; byteSize: number }> {
      try {
        const response = await client.send(new GetObjectCommand({ Bucket, Key: key }))
        return { body: response.Body as Readable, byteSize: Number(response.ContentLength ?? 0) }
      } catch (error) {
        if (isNotFound(error)) throw new ObjectNotFoundError(key)
        throw error
      }
    },

    /** Size of the object, or null when the bucket does not hold it. */
    async head(key: string): Promise<{ byteSize: number } | null> {
      try {
        const response = await client.send(new HeadObjectCommand({ Bucket, Key: key }))
        return { byteSize: Number(response.ContentLength ?? 0) }
      } catch (error) {
        if (isNotFound(error)) return null
        throw error
      }
    },

    /** Server-side copy (single request: fine up to 5 GB, far above the upload limit). */
    async copy(sourceKey: string, targetKey: string): Promise<void> {
      await client.send(new CopyObjectCommand({ Bucket, Key: targetKey, CopySource: `${Bucket}/${encodeURIComponent(sourceKey).replace(/%2F/g, '/')}` }))
    },

    /** Removes the keys; keys that do not exist are not an error. */
    async remove(keys: string[]): Promise<void> {
      for (let start = 0; start < keys.length; start += DELETE_BATCH) {
        const batch = keys.slice(start, start + DELETE_BATCH)
        const response = await client.send(new DeleteObjectsCommand({ Bucket, Delete: { Objects: batch.map((Key) => ({ Key })), Quiet: true } }))
        const failed = (response.Errors ?? []).filter((entry) => entry.Code !== 'NoSuchKey')
        if (failed.length > 0) throw new Error(`Could not remove ${failed.length} object(s), first ${failed[0]!.Key}: ${failed[0]!.Message}`)
      }
    },

    /** Every object under the prefix, page by page. */
    async *list(prefix: string): AsyncGenerator<StoredObjectInfo> {
      for await (const page of paginateListObjectsV2({ client }, { Bucket, Prefix: prefix })) {
        for (const entry of page.Contents ?? []) {
          if (entry.Key) yield { key: entry.Key, byteSize: Number(entry.Size ?? 0), lastModified: entry.LastModified ?? new Date(0) }
        }
      }
    },

    /**
     * Aborts multipart uploads under the prefix started before `startedBefore` (a server killed
     * mid-upload leaves them). Returns how many, or null when the server cannot list them.
     */
    async abortMultipartUploads(prefix: string, startedBefore: Date): Promise<number | null> {
      let response
      try {
        response = await client.send(new ListMultipartUploadsCommand({ Bucket, Prefix: prefix }))
      } catch (error) {
        if (error instanceof S3ServiceException && (error.name === 'NotImplemented' || error.$metadata.httpStatusCode === 501)) return null
        throw error
      }
      const stale = (response.Uploads ?? []).filter((upload) => upload.Key && upload.UploadId && (upload.Initiated ?? new Date(0)) < startedBefore)
      for (const upload of stale) await client.send(new AbortMultipartUploadCommand({ Bucket, Key: upload.Key!, UploadId: upload.UploadId! }))
      return stale.length
    },

    close(): void {
      client.destroy()
    },
  }
}
