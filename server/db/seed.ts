import { createSequelize } from './createSequelize'
import { initModels } from '../models'
import { loadConfig } from '../config'
import { seedDemoData } from './demoData'

// `npm run seed`: inserts the invented demo scenario once (see demoData.ts).
const config = loadConfig()
const sequelize = createSequelize(config.DATABASE_URL)
initModels(sequelize)
try {
  const wrote = await seedDemoData(sequelize, { storageDir: config.STORAGE_DIR })
  console.log(wrote ? 'ringdown: demo data seeded' : 'ringdown: demo data already present')
} catch (error) {
  console.error(`ringdown: seeding failed: ${(error as Error).message}`)
  process.exitCode = 1
} finally {
  await sequelize.close()
}
