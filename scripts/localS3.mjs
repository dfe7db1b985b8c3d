// The local S3-compatible fake that the start, test and bench commands run when S3_ENDPOINT is
// not set: s3rver from npm on loopback, objects kept as files under the given folder.
// Usage: node scripts/localS3.mjs <data folder> <port> <bucket>
import path from 'node:path'
import { readdir, rm, stat } from 'node:fs/promises'
import S3rver from 's3rver'

const [directory, portText, bucket] = process.argv.slice(2)
if (!directory || !portText || !bucket) {
  console.error('usage: node scripts/localS3.mjs <data folder> <port> <bucket>')
  process.exit(2)
}
// s3rver keeps the parts of unfinished multipart uploads here and never drops abandoned ones.
const uploadsDir = path.join(directory, bucket, '._S3rver_uploads')
const ABANDONED_AFTER_MS = 24 * 3600 * 1000

async function removeAbandonedUploads(olderThanMs) {
  const entries = await readdir(uploadsDir).catch(() => [])
  for (const entry of entries) {
    const entryPath = path.join(uploadsDir, entry)
    const { mtimeMs } = await stat(entryPath).catch(() => ({ mtimeMs: Date.now() }))
    if (Date.now() - mtimeMs >= olderThanMs) await rm(entryPath, { recursive: true, force: true })
  }
}

// Before listening nothing can be mid-upload: every unfinished upload was cut off by a stop.
await removeAbandonedUploads(0)
const server = new S3rver({ address: '127.0.0.1', port: Number(portText), directory, silent: true, configureBuckets: [{ name: bucket }] })
await server.run()
console.log(`ringdown-s3: listening on 127.0.0.1:${portText}, bucket ${bucket}`)
setInterval(() => void removeAbandonedUploads(ABANDONED_AFTER_MS), 3600 * 1000).unref()

async function stop() {
  await server.close().catch(() => {})
  process.exit(0)
}
process.on('SIGTERM', stop)
process.on('SIGINT', stop)
