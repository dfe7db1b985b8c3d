import multer from 'multer'
import { mkdirSync } from 'node:fs'
import path from 'node:path'
import type { RequestHandler } from 'express'

/**
 * Multipart upload streamed to `<storage>/incoming/` (never held in memory). Fields: `file` (the
 * capture) and optional `reference` (the reference sweep). Multer removes partial files itself
 * when a limit is hit; the capture service removes the rest on any later failure.
 */
export function captureUpload(storageDir: string, limitMb: number): RequestHandler {
  const incomingDir = path.join(storageDir, 'incoming')
  mkdirSync(incomingDir, { recursive: true })
  return multer({
    dest: incomingDir,
    limits: { fileSize: Math.round(limitMb * 1024 * 1024), files: 2, fields: 30, fieldSize: 10_000 },
  }).fields([
    { name: 'file', maxCount: 1 },
    { name: 'reference', maxCount: 1 },
  ])
}
