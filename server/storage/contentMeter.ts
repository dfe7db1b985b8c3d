import { createHash } from 'node:crypto'
import { Transform, type TransformCallback } from 'node:stream'

/** What a stream held, learned while it passed through. */
export interface MeteredContent {
  sha256: string
  byteSize: number
  /** The first bytes (at most the head limit), for header checks. */
  headBytes: Uint8Array
}

/**
 * A pass-through that hashes (sha256), counts and keeps the first `headLimitBytes` of what flows
 * through it, so an upload can stream to storage and still be checked and content-addressed.
 */
export class ContentMeter extends Transform {
  private readonly hash = createHash('sha256')
  private readonly head: Buffer[] = []
  private headByteCount = 0
  private byteCount = 0

  constructor(private readonly headLimitBytes: number) {
    super()
  }

  override _transform(chunk: Buffer, _encoding: BufferEncoding, callback: TransformCallback): void {
    this.hash.update(chunk)
    this.byteCount += chunk.length
    if (this.headByteCount < this.headLimitBytes) {
      // A copy, so the kept head does not pin the whole incoming chunk.
      const part = Buffer.from(chunk.subarray(0, this.headLimitBytes - this.headByteCount))
      this.head.push(part)
      this.headByteCount += part.length
    }
    callback(null, chunk)
  }

  /** Call once the stream has ended. */
  result(): MeteredContent {
    return { sha256: this.hash.digest('hex'), byteSize: this.byteCount, headBytes: new Uint8Array(Buffer.concat(this.head)) }
  }
}
