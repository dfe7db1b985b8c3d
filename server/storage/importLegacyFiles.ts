import { createHash } from 'node:crypto'
import { createReadStream } from 'node:fs'
import { readdir, rm, rmdir, stat } from 'node:fs/promises'
import path from 'node:path'
import { contentKey, isSha256 } from './contentKeys'
import type { ObjectStore } from './createObjectStore'

export interface LegacyImportReport {
  /** Files moved into the bucket. */
  imported: number
  /** Files whose content the bucket already held (removed locally). */
  alreadyStored: number
  /** Temporary files of an interrupted upload of the earlier version (removed). */
  temporaryRemoved: number
  /** Files left in place: not named like stored content, or whose bytes do not match their name. */
  leftInPlace: string[]
}

async function sha256OfFile(filePath: string): Promise<string> {
  const hash = createHash('sha256')
  for await (const chunk of createReadStream(filePath)) hash.update(chunk as Buffer)
  return hash.digest('hex')
}

/** Removes empty folders below (and including) `dir`, deepest first. */
async function removeEmptyFolders(dir: string): Promise<void> {
  const entries = await readdir(dir, { withFileTypes: true })
  for (const entry of entries) if (entry.isDirectory()) await removeEmptyFolders(path.join(dir, entry.name))
  if ((await readdir(dir)).length === 0) await rmdir(dir)
}

/**
 * Moves the files an earlier version kept on the server's disk (`<dir>/ab/cd/<sha256>`, the
 * STORAGE_DIR layout) into the bucket under their content keys. Each file is hashed first and
 * moved only when its bytes match its name; the local copy is removed only once the bucket holds
 * an object of the same size. Temporary files under `incoming/` are removed. Running it again
 * (or after an interruption) finds only what is still left to do; a missing folder is no work.
 */
export async function importLegacyFiles(store: ObjectStore, legacyDir: string): Promise<LegacyImportReport> {
  const report: LegacyImportReport = { imported: 0, alreadyStored: 0, temporaryRemoved: 0, leftInPlace: [] }
  if (!(await stat(legacyDir).then((s) => s.isDirectory(), () => false))) return report
  const entries = await readdir(legacyDir, { recursive: true, withFileTypes: true })
  for (const entry of entries.filter((e) => e.isFile())) {
    const filePath = path.join(entry.parentPath, entry.name)
    const relative = path.relative(legacyDir, filePath).split(path.sep)
    if (relative[0] === 'incoming') {
      await rm(filePath, { force: true })
      report.temporaryRemoved++
      continue
    }
    const sha256 = entry.name
    const isContentFile = isSha256(sha256) && relative.length === 3 && relative[0] === sha256.slice(0, 2) && relative[1] === sha256.slice(2, 4)
    if (!isContentFile || (await sha256OfFile(filePath)) !== sha256) {
      report.leftInPlace.push(filePath)
      continue
    }
    const { size } = await stat(filePath)
    const key = contentKey(sha256)
    if ((await store.head(key))?.byteSize === size) {
      report.alreadyStored++
    } else {
      await store.putStream(key, createReadStream(filePath), 'audio/wav')
      if ((await store.head(key))?.byteSize !== size) throw new Error(`The bucket did not keep ${filePath} whole; nothing was removed locally.`)
      report.imported++
    }
    await rm(filePath)
  }
  await removeEmptyFolders(legacyDir)
  return report
}
