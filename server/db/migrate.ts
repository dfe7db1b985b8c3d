import { createSequelize } from './createSequelize'
import { createMigrator } from './createMigrator'
import { loadConfig } from '../config'
import { createObjectStore } from '../storage/createObjectStore'
import { importLegacyFiles } from '../storage/importLegacyFiles'

// `npm run migrate` (up: the database, then storage) or `tsx server/db/migrate.ts down` (one
// database step back). Storage: the bucket is created when missing, and files an earlier version
// kept in STORAGE_DIR are moved into it once.
const direction = process.argv[2] ?? 'up'
const config = loadConfig()
const sequelize = createSequelize(config.DATABASE_URL)
const migrator = createMigrator(sequelize)
const store = createObjectStore(config)
try {
  const applied = direction === 'down' ? await migrator.down() : await migrator.up()
  console.log(`ringdown: migrations ${direction}: ${applied.map((m) => m.name).join(', ') || 'none pending'}`)
  if (direction === 'up') {
    await store.ensureBucket()
    const moved = await importLegacyFiles(store, config.STORAGE_DIR)
    if (moved.imported + moved.alreadyStored + moved.temporaryRemoved > 0) {
      console.log(`ringdown: moved ${moved.imported} stored file(s) from ${config.STORAGE_DIR} into bucket ${store.bucket} (${moved.alreadyStored} already there, ${moved.temporaryRemoved} temporary file(s) removed)`)
    }
    for (const file of moved.leftInPlace) console.warn(`ringdown: left ${file} in place: it is not a stored file of Ringdown or its bytes do not match its name`)
  }
} catch (error) {
  console.error(`ringdown: migration failed: ${(error as Error).message}`)
  process.exitCode = 1
} finally {
  store.close()
  await sequelize.close()
}
