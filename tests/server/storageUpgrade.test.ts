import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { spawnSync } from 'node:child_process'
import { createHash } from 'node:crypto'
import { mkdir, mkdtemp, readdir, rm, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { QueryTypes } from 'sequelize'
import { createMigrator } from '../../server/db/createMigrator'
import { contentKey } from '../../server/storage/contentKeys'
import { readContent } from '../../server/storage/readContent'
import { startTestServices, type TestServices } from '../helpers/testServices'
import { decayingNoiseWav } from '../helpers/wavFixtures'

// The upgrade from the version that kept files on the server's disk: a database at migration
// 0004 and a STORAGE_DIR folder laid out as that version did (`ab/cd/<sha256>`, temporary files
// under `incoming/`), upgraded by `npm run migrate` as the start command runs it.

let services: TestServices
let legacyDir: string

const sha256Of = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex')
/** Where the previous version kept a file (its contentPath). */
const legacyPath = (sha256: string) => path.join(legacyDir, sha256.slice(0, 2), sha256.slice(2, 4), sha256)

async function writeLegacyFile(bytes: Uint8Array): Promise<string> {
  const sha256 = sha256Of(bytes)
  await mkdir(path.dirname(legacyPath(sha256)), { recursive: true })
  await writeFile(legacyPath(sha256), bytes)
  return sha256
}

/** `npm run migrate` in a child process, as the start command runs it. */
function runMigrate(): { status: number | null; output: string } {
  const result = spawnSync(process.execPath, ['--import', 'tsx', 'server/db/migrate.ts', 'up'], {
    env: { ...process.env, DATABASE_URL: services.config.DATABASE_URL, S3_BUCKET: services.config.S3_BUCKET, STORAGE_DIR: legacyDir, LOG_LEVEL: 'silent' },
    encoding: 'utf8',
    timeout: 120_000,
  })
  return { status: result.status, output: `${result.stdout}${result.stderr}` }
}

async function filesUnder(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true }).catch(() => [])
  return entries.filter((entry) => entry.isFile()).map((entry) => path.relative(dir, path.join(entry.parentPath, entry.name)))
}

const files = {
  impulse: decayingNoiseWav({ seed: 201 }),
  shared: decayingNoiseWav({ seed: 202 }),
  recording: decayingNoiseWav({ seed: 203, durationS: 2 }),
}
let captures: { id: number; sha256: string; referenceSha256: string | null }[] = []

beforeAll(async () => {
  services = await startTestServices()
  legacyDir = await mkdtemp(path.join(tmpdir(), 'ringdown-legacy-files-'))
  // The previous version's schema, with its rows.
  await services.sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;')
  await createMigrator(services.sequelize).up({ to: '0004-invitations-shares-activity' })
  const insert = async (sql: string, replacements: Record<string, unknown>) =>
    (await services.sequelize.query<{ id: number }>(`${sql} RETURNING id`, { replacements, type: QueryTypes.SELECT }))[0]!.id
  const now = new Date()
  const workspaceId = await insert('INSERT INTO workspaces (name, created_at, updated_at) VALUES (:name, :now, :now)', { name: 'Upgraded workspace', now })
  const roomId = await insert("INSERT INTO rooms (workspace_id, name, use, created_at, updated_at) VALUES (:workspaceId, 'Old room', 'control-room', :now, :now)", { workspaceId, now })
  const surveyId = await insert("INSERT INTO surveys (room_id, name, measured_on, created_at, updated_at) VALUES (:roomId, 'Bare room', '2026-01-01', :now, :now)", { roomId, now })
  const sha = { impulse: await writeLegacyFile(files.impulse), shared: await writeLegacyFile(files.shared), recording: await writeLegacyFile(files.recording) }
  const rows = [
    { sha256: sha.impulse, referenceSha256: null, kind: 'impulse' },
    { sha256: sha.shared, referenceSha256: null, kind: 'impulse' },
    { sha256: sha.shared, referenceSha256: null, kind: 'impulse' }, // the same file uploaded twice
    { sha256: sha.recording, referenceSha256: sha.shared, kind: 'sweep' }, // and as a reference sweep
  ]
  captures = []
  for (const row of rows) {
    const id = await insert(
      `INSERT INTO captures (survey_id, kind, reference_sha256, original_name, sha256, byte_size, sample_rate_hz, bit_depth, channel_count, duration_s, status, created_at, updated_at)
       VALUES (:surveyId, :kind, :referenceSha256, 'old.wav', :sha256, 1, 48000, 16, 1, 1, 'done', :now, :now)`,
      { surveyId, now, ...row },
    )
    captures.push({ id, sha256: row.sha256, referenceSha256: row.referenceSha256 })
  }
  // A temporary file of an upload the previous version never finished, and a stranger.
  await mkdir(path.join(legacyDir, 'incoming'), { recursive: true })
  await writeFile(path.join(legacyDir, 'incoming', '3f2a9c1e'), 'half an upload')
  await writeFile(path.join(legacyDir, 'notes.txt'), 'not a stored file')
}, 120_000)
afterAll(async () => {
  await services.close()
  await rm(legacyDir, { recursive: true, force: true })
})

describe('npm run migrate on a database and a files folder of the previous version', () => {
  it("moves every capture's file and reference sweep into the bucket, byte for byte", async () => {
    const first = runMigrate()
    expect(first.status, first.output).toBe(0)
    expect(first.output).toMatch(/0005-content-references/)
    expect(first.output).toMatch(/moved 3 stored file\(s\)/)
    for (const capture of captures) {
      for (const sha256 of [capture.sha256, capture.referenceSha256].filter((sha): sha is string => sha !== null)) {
        expect(sha256Of(await readContent(services.store, sha256))).toBe(sha256)
      }
    }
    expect(await services.objectKeys()).toEqual([...new Set(captures.map((c) => c.sha256))].map(contentKey).sort())
  })

  it('empties the old folder except for a file it does not know, which it names', async () => {
    expect(await filesUnder(legacyDir)).toEqual(['notes.txt'])
  })

  it('changes nothing when run again (idempotent)', async () => {
    const keysBefore = await services.objectKeys()
    const again = runMigrate()
    expect(again.status, again.output).toBe(0)
    expect(again.output).toMatch(/none pending/)
    expect(again.output).not.toMatch(/moved/)
    expect(await services.objectKeys()).toEqual(keysBefore)
  })

  it('finishes an interrupted move: a file already in the bucket but still on disk is only removed locally', async () => {
    const sha256 = captures[0]!.sha256
    await writeLegacyFile(files.impulse)
    const rerun = runMigrate()
    expect(rerun.status, rerun.output).toBe(0)
    expect(rerun.output).toMatch(/moved 0 stored file\(s\).*1 already there/)
    expect(await filesUnder(legacyDir)).toEqual(['notes.txt'])
    expect(sha256Of(await readContent(services.store, sha256))).toBe(sha256)
  })

  it('leaves a damaged file (bytes that do not match its name) in place and says so', async () => {
    const fakeSha = 'ab'.repeat(32)
    await mkdir(path.dirname(legacyPath(fakeSha)), { recursive: true })
    await writeFile(legacyPath(fakeSha), 'damaged bytes')
    const rerun = runMigrate()
    expect(rerun.status, rerun.output).toBe(0)
    expect(rerun.output).toContain(`left ${legacyPath(fakeSha)} in place`)
    expect(await services.store.head(contentKey(fakeSha))).toBeNull()
  })
})
