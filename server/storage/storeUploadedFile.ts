import { createHash } from 'node:crypto'
import { createReadStream } from 'node:fs'
import { mkdir, rename, rm, stat } from 'node:fs/promises'
import path from 'node:path'
import { contentPath } from './contentPath'

export async function sha256OfFile(filePath: string): Promise<string> {
  const hash = createHash('sha256')
  for await (const chunk of createReadStream(filePath)) hash.update(chunk as Buffer)
  return hash.digest('hex')
}

/**
 * Moves an uploaded temporary file to its content-addressed place. A file with the same content
 * already stored is kept and the temporary copy removed. Returns the sha256 and whether it was new.
 */
export async function storeUploadedFile(storageDir: string, tempPath: string): Promise<{ sha256: string; isNew: boolean }> {
  const sha256 = await sha256OfFile(tempPath)
  const target = contentPath(storageDir, sha256)
  const exists = await stat(target).then(() => true, () => false)
  if (exists) {
    await rm(tempPath, { force: true })
    return { sha256, isNew: false }
  }
  await mkdir(path.dirname(target), { recursive: true })
  await rename(tempPath, target)
  return { sha256, isNew: true }
}
