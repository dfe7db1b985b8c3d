import { createSequelize } from './createSequelize'
import { createMigrator } from './createMigrator'
import { loadConfig } from '../config'

// `npm run migrate` (up) or `tsx server/db/migrate.ts down` (one step back).
const direction = process.argv[2] ?? 'up'
const config = loadConfig()
const sequelize = createSequelize(config.DATABASE_URL)
const migrator = createMigrator(sequelize)
try {
  const applied = direction === 'down' ? await migrator.down() : await migrator.up()
  console.log(`ringdown: migrations ${direction}: ${applied.map((m) => m.name).join(', ') || 'none pending'}`)
} catch (error) {
  console.error(`ringdown: migration failed: ${(error as Error).message}`)
  process.exitCode = 1
} finally {
  await sequelize.close()
}
