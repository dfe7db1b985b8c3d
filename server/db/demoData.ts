import type { Sequelize } from 'sequelize'
import { Membership, Room, RoomShare, Survey, User, Workspace } from '../models'
import { hashPassword } from '../services/authService'
import { createDemoCaptures } from './demoCaptures'
import type { Role } from '../../shared/api/common'
import type { ObjectStore } from '../storage/createObjectStore'

/**
 * Demo data: an invented scenario. The consultancy, the people, the rooms and every figure here
 * are made up for demonstration; they describe no real person, company or place.
 */
export const DEMO_PASSWORD = 'ringdown-demo'

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: 'owner@ringdown.test', name: 'Demo Owner', role: 'owner' },
  { email: 'engineer@ringdown.test', name: 'Demo Engineer', role: 'engineer' },
  { email: 'client@ringdown.test', name: 'Demo Client', role: 'client' },
  { email: 'viewer@ringdown.test', name: 'Demo Student', role: 'viewer' },
]

const DEMO_WORKSPACE = 'Demo Consultancy (invented)'

/**
 * Inserts the demo workspace once; running it again changes nothing. Returns whether it wrote.
 * The demo captures are left `uploaded`: the server queues them at start and the worker analyses them.
 */
export async function seedDemoData(sequelize: Sequelize, options: { store: ObjectStore }): Promise<boolean> {
  if (await User.findOne({ where: { email: DEMO_ACCOUNTS[0]!.email } })) return false
  const passwordHash = await hashPassword(DEMO_PASSWORD)
  await sequelize.transaction(async (transaction) => {
    const workspace = await Workspace.create({ name: DEMO_WORKSPACE }, { transaction })
    const users = new Map<Role, User>()
    for (const account of DEMO_ACCOUNTS) {
      const user = await User.create({ email: account.email, name: account.name, passwordHash }, { transaction })
      await Membership.create({ workspaceId: workspace.id, userId: user.id, role: account.role }, { transaction })
      users.set(account.role, user)
    }
    const studio = await Room.create(
      {
        workspaceId: workspace.id,
        name: 'Garden studio control room',
        clientName: 'Demo Client',
        address: '1 Example Lane (invented)',
        use: 'control-room',
        lengthM: 4.6,
        widthM: 3.4,
        heightM: 2.5,
        volumeM3: null,
        notes: 'Invented demo room: a converted garden building used for mixing. Bass builds up at the desk.',
      },
      { transaction },
    )
    await Room.create(
      {
        workspaceId: workspace.id,
        name: 'Rehearsal room B',
        clientName: 'Demo Music School (invented)',
        address: '',
        use: 'rehearsal-room',
        lengthM: 7.2,
        widthM: 5.1,
        heightM: 3.0,
        volumeM3: null,
        notes: 'Invented demo room.',
      },
      { transaction },
    )
    await Room.create(
      { workspaceId: workspace.id, name: 'Attic listening room', clientName: '', address: '', use: 'home-theatre', lengthM: null, widthM: null, heightM: null, volumeM3: 38, notes: 'Irregular room under a sloping roof (invented demo).' },
      { transaction },
    )
    await RoomShare.create({ roomId: studio.id, userId: users.get('client')!.id }, { transaction })
    await RoomShare.create({ roomId: studio.id, userId: users.get('viewer')!.id }, { transaction })
    const bare = await Survey.create(
      { roomId: studio.id, name: 'Bare room', measuredOn: '2026-09-14', temperatureC: 20.5, humidityPercent: 48, treatmentDescription: 'Empty apart from desk, chair and speakers on stands.' },
      { transaction },
    )
    const treated = await Survey.create(
      { roomId: studio.id, name: 'After panels and bass traps', measuredOn: '2026-10-26', temperatureC: 19.0, humidityPercent: 52, treatmentDescription: 'Broadband panels at the first-reflection points, ceiling cloud, corner bass traps.' },
      { transaction },
    )
    await createDemoCaptures(bare, 'bare', options.store, transaction)
    await createDemoCaptures(treated, 'treated', options.store, transaction)
  })
  return true
}
