import { createSequelize } from './createSequelize'
import { initModels } from '../models'
import { loadConfig } from '../config'
import { seedDemoData } from './demoData'
import { createObjectStore } from '../storage/createObjectStore'

// `npm run seed`: inserts the invented demo scenario once (see demoData.ts).
const config = loadConfig()
const sequelize = createSequelize(config.DATABASE_URL)
initModels(sequelize)
const store = createObjectStore(config)
try {
  const wrote = await seedDemoData(sequelize, { store })
  console.log(wrote ? 'ringdown: demo data seeded' : 'ringdown: demo data already present')
} catch (error) {
  console.error(`ringdown: seeding failed: ${(error as Error).message}`)
  process.exitCode = 1
} finally {
  store.close()
  await sequelize.close()
}
