import { Umzug, SequelizeStorage } from 'umzug'
import type { Sequelize } from 'sequelize'
import * as initial from '../migrations/0001-initial'
import * as analyses from '../migrations/0002-analyses'
import * as roomModels from '../migrations/0003-room-models'
import * as invitationsSharesActivity from '../migrations/0004-invitations-shares-activity'
import * as contentReferences from '../migrations/0005-content-references'
import * as analysisJobRecord from '../migrations/0010-analysis-job-record'
import * as analysisHeadlineColumns from '../migrations/0011-analysis-headline-columns'
import * as analysisChangeNotifications from '../migrations/0012-analysis-change-notifications'
import * as customTargetsAndProfiles from '../migrations/0030-custom-targets-and-profiles'
import * as captureInclusionAndPin from '../migrations/0031-capture-inclusion-and-pin'
import * as reportRevisions from '../migrations/0032-report-revisions'
import * as apiTokens from '../migrations/0050-api-tokens'

/**
 * Migrations are listed explicitly (not globbed) so the worker, tests and the CLI all see the same
 * ordered set whether they run from TypeScript sources or a bundle.
 */
const MIGRATIONS = [
  { name: '0001-initial', module: initial },
  { name: '0002-analyses', module: analyses },
  { name: '0003-room-models', module: roomModels },
  { name: '0004-invitations-shares-activity', module: invitationsSharesActivity },
  { name: '0005-content-references', module: contentReferences },
  { name: '0010-analysis-job-record', module: analysisJobRecord },
  { name: '0011-analysis-headline-columns', module: analysisHeadlineColumns },
  { name: '0012-analysis-change-notifications', module: analysisChangeNotifications },
  { name: '0030-custom-targets-and-profiles', module: customTargetsAndProfiles },
  { name: '0031-capture-inclusion-and-pin', module: captureInclusionAndPin },
  { name: '0032-report-revisions', module: reportRevisions },
  { name: '0050-api-tokens', module: apiTokens },
]

export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: MIGRATIONS.map(({ name, module }) => ({
      name,
      up: () => module.up(sequelize.getQueryInterface()),
      down: () => module.down(sequelize.getQueryInterface()),
    })),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  })
}
