import { QueryTypes, type Sequelize, type Transaction } from 'sequelize'
import { Capture } from '../models'

/**
 * Every column that points at stored content by sha256. Content stays in the bucket while any
 * row names it here; a column added later that holds a sha256 must be listed (and given the
 * release trigger of migration 0005) or its files can be removed under it.
 */
export const CONTENT_REFERENCE_COLUMNS = [
  { table: 'captures', column: 'sha256' },
  { table: 'captures', column: 'reference_sha256' },
] as const

/** The database the models were initialised with (server, worker and tests all call initModels). */
export function contentDatabase(): Sequelize {
  const sequelize = Capture.sequelize
  if (!sequelize) throw new Error('initModels must run before stored content is touched')
  return sequelize
}

/** Advisory-lock namespace of content locks (any constant of our own; keeps clear of other locks). */
const CONTENT_LOCK_NAMESPACE = 0x5244

/** A sha256 folded into PostgreSQL's int4 for the two-key advisory lock. */
function lockKey(sha256: string): number {
  return Number.parseInt(sha256.slice(0, 8), 16) | 0
}

/**
 * Holds each content's lock until the transaction ends. Whoever creates a row that points at
 * content, or decides that content is unused and removes it, does so under this lock, so a new
 * reference can never be written while the object it names is being removed. Locks are taken in
 * sorted order so two uploads sharing files cannot deadlock.
 */
export async function lockContent(sha256s: string[], transaction: Transaction): Promise<void> {
  const keys = [...new Set(sha256s.map(lockKey))].sort((a, b) => a - b)
  for (const key of keys) {
    await contentDatabase().query('SELECT pg_advisory_xact_lock(:namespace, :key)', { replacements: { namespace: CONTENT_LOCK_NAMESPACE, key }, transaction, type: QueryTypes.SELECT })
  }
}

/** How many rows, over every column of {@link CONTENT_REFERENCE_COLUMNS}, name this content. */
export async function countContentReferences(sha256: string, transaction?: Transaction): Promise<number> {
  const terms = CONTENT_REFERENCE_COLUMNS.map(({ table, column }) => `(SELECT count(*) FROM ${table} WHERE ${column} = :sha256)`)
  const [row] = await contentDatabase().query<{ references: string }>(`SELECT ${terms.join(' + ')} AS "references"`, { replacements: { sha256 }, transaction, type: QueryTypes.SELECT })
  return Number(row?.references ?? 0)
}

/** Every sha256 any row names, for the sweep of unreferenced objects. */
export async function referencedContent(): Promise<Set<string>> {
  const selects = CONTENT_REFERENCE_COLUMNS.map(({ table, column }) => `SELECT ${column} AS sha256 FROM ${table} WHERE ${column} IS NOT NULL`)
  const rows = await contentDatabase().query<{ sha256: string }>(selects.join(' UNION '), { type: QueryTypes.SELECT })
  return new Set(rows.map((row) => row.sha256))
}
