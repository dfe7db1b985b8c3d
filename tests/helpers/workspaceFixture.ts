import { Capture, Membership, Room, RoomShare, Survey, User, Workspace } from '../../server/models'
import { hashPassword } from '../../server/services/authService'
import type { Role } from '../../shared/api/common'

export const FIXTURE_PASSWORD = 'fixture-password-1'

export interface WorkspaceFixture {
  workspace: Workspace
  users: Record<Role, User>
  /** A room shared with the client and the viewer, and one shared with nobody. */
  sharedRoom: Room
  privateRoom: Room
  sharedSurvey: Survey
  privateSurvey: Survey
  /** A capture row in the shared survey (no file behind it: for access checks only). */
  sharedCapture: Capture
}

/** A workspace with one member per role, two rooms and a survey in each. */
export async function createWorkspaceFixture(label: string): Promise<WorkspaceFixture> {
  const passwordHash = await hashPassword(FIXTURE_PASSWORD)
  const workspace = await Workspace.create({ name: `Workspace ${label}` })
  const users = {} as Record<Role, User>
  for (const role of ['owner', 'engineer', 'client', 'viewer'] as const) {
    const user = await User.create({ name: `${label} ${role}`, email: `${role}@${label.toLowerCase()}.test`, passwordHash })
    await Membership.create({ workspaceId: workspace.id, userId: user.id, role })
    users[role] = user
  }
  const room = (name: string) =>
    Room.create({ workspaceId: workspace.id, name, use: 'control-room', lengthM: 5, widthM: 4, heightM: 2.5, volumeM3: null })
  const sharedRoom = await room(`${label} shared room`)
  const privateRoom = await room(`${label} private room`)
  for (const role of ['client', 'viewer'] as const) await RoomShare.create({ roomId: sharedRoom.id, userId: users[role].id })
  const survey = (roomId: number) => Survey.create({ roomId, name: 'Bare room', measuredOn: '2026-01-10', temperatureC: 20, humidityPercent: 50 })
  const sharedSurvey = await survey(sharedRoom.id)
  const sharedCapture = await Capture.create({
    surveyId: sharedSurvey.id, uploadedById: users.engineer.id, kind: 'impulse', positionXM: null, positionYM: null, positionZM: null,
    sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null, referenceSha256: null, originalName: 'fixture.wav', sha256: '0'.repeat(64),
    byteSize: 0, sampleRateHz: 48_000, bitDepth: 24, channelCount: 1, durationS: 1,
  })
  return { workspace, users, sharedRoom, privateRoom, sharedSurvey, privateSurvey: await survey(privateRoom.id), sharedCapture }
}
