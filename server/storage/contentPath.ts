import path from 'node:path'

/** Content-addressed location of a stored file: `<root>/ab/cd/<sha256>`. */
export function contentPath(storageDir: string, sha256: string): string {
  if (!/^[0-9a-f]{64}$/.test(sha256)) throw new Error('contentPath needs a lower-case hex sha256')
  return path.join(storageDir, sha256.slice(0, 2), sha256.slice(2, 4), sha256)
}
