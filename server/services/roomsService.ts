import { Op, fn, col, type WhereOptions } from 'sequelize'
import { Room, RoomShare, Survey } from '../models'
import { requireRoomAccess, requireWorkspaceRole, roomPermissions } from '../policy/roomAccess'
import { mayInWorkspace } from '../policy/policy'
import { requireMembershipRole } from './membershipLookup'
import { ValidationError } from '../errors'
import { recordActivity } from './activityService'
import { releaseQueuedContent } from '../storage/releaseContent'
import type { ObjectStore } from '../storage/createObjectStore'
import type { CreateRoomBody, RoomDto, UpdateRoomBody } from '../../shared/api/rooms'
import type { Role } from '../../shared/api/common'
import { describeRoomTarget, isChoosableTargetProfile } from './roomTargetService'
import { noteReportChange } from './reportDrafts'

async function surveyFacts(roomIds: number[]): Promise<Map<number, { count: number; last: string | null }>> {
  const rows = (await Survey.findAll({
    attributes: ['roomId', [fn('COUNT', col('id')), 'count'], [fn('MAX', col('measured_on')), 'last']],
    where: { roomId: roomIds },
    group: ['roomId'],
    raw: true,
  })) as unknown as { roomId: number; count: string; last: string | null }[]
  return new Map(rows.map((row) => [row.roomId, { count: Number(row.count), last: row.last }]))
}

async function toRoomDto(room: Room, role: Role, isShared: boolean, facts?: { count: number; last: string | null }): Promise<RoomDto> {
  return {
    id: room.id,
    workspaceId: room.workspaceId,
    name: room.name,
    clientName: room.clientName,
    address: room.address,
    use: room.use,
    lengthM: room.lengthM,
    widthM: room.widthM,
    heightM: room.heightM,
    volumeM3: room.volumeM3,
    effectiveVolumeM3: room.effectiveVolumeM3(),
    targetProfile: room.targetProfile,
    target: await describeRoomTarget(room),
    notes: room.notes,
    surveyCount: facts?.count ?? 0,
    lastSurveyOn: facts?.last ?? null,
    createdAt: room.createdAt.toISOString(),
    updatedAt: room.updatedAt.toISOString(),
    permissions: roomPermissions(role, isShared),
  }
}

/** Rooms of a workspace the caller may see; clients and viewers see only rooms shared with them. */
export async function listRooms(userId: number, workspaceId: number, search?: string): Promise<RoomDto[]> {
  const role = await requireMembershipRole(userId, workspaceId)
  const where: WhereOptions<Room> = { workspaceId }
  const sharedIds = new Set(
    (await RoomShare.findAll({ where: { userId }, attributes: ['roomId'], raw: true })).map((s) => s.roomId),
  )
  const conditions: WhereOptions<Room>[] = [where]
  if (!mayInWorkspace(role, 'room:list-all')) conditions.push({ id: [...sharedIds] })
  if (search) {
    const pattern = `%${search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`
    conditions.push({ [Op.or]: [{ name: { [Op.iLike]: pattern } }, { clientName: { [Op.iLike]: pattern } }, { address: { [Op.iLike]: pattern } }] })
  }
  const rooms = await Room.findAll({ where: { [Op.and]: conditions }, order: [['updatedAt', 'DESC']] })
  const facts = await surveyFacts(rooms.map((r) => r.id))
  return Promise.all(rooms.map((room) => toRoomDto(room, role, sharedIds.has(room.id), facts.get(room.id))))
}

export async function createRoom(userId: number, workspaceId: number, body: CreateRoomBody): Promise<RoomDto> {
  const role = await requireWorkspaceRole(userId, workspaceId, 'room:create')
  await assertChoosableTarget(workspaceId, body.targetProfile)
  const room = await Room.create({ ...body, workspaceId })
  await recordActivity({ workspaceId, roomId: room.id, userId, action: 'room.created', summary: `created the room "${room.name}"` })
  return toRoomDto(room, role, false)
}

export async function getRoom(userId: number, roomId: number): Promise<RoomDto> {
  const { room, role, isShared } = await requireRoomAccess(userId, roomId, 'room:read')
  return toRoomDto(room, role, isShared, (await surveyFacts([room.id])).get(room.id))
}

export async function updateRoom(userId: number, roomId: number, body: UpdateRoomBody): Promise<RoomDto> {
  const { room, role, isShared } = await requireRoomAccess(userId, roomId, 'room:update')
  const previousTarget = body.targetProfile !== undefined && body.targetProfile !== room.targetProfile ? await describeRoomTarget(room) : null
  if (previousTarget) await assertChoosableTarget(room.workspaceId, body.targetProfile!)
  room.set(body)
  const dimensionsComplete = room.lengthM !== null && room.widthM !== null && room.heightM !== null
  if (!dimensionsComplete && room.volumeM3 === null) {
    throw new ValidationError('Give length, width and height, or a volume.', { lengthM: 'Give length, width and height, or a volume.' })
  }
  await room.save()
  if (previousTarget) {
    const next = await describeRoomTarget(room)
    const summary = `changed the target from “${previousTarget.name}” to “${next.name}”`
    await recordActivity({ workspaceId: room.workspaceId, roomId, userId, action: 'room.target-changed', summary })
    await noteReportChange(roomId, null, `Target changed to “${next.name}”`)
  }
  return toRoomDto(room, role, isShared, (await surveyFacts([room.id])).get(room.id))
}

async function assertChoosableTarget(workspaceId: number, profile: string): Promise<void> {
  if (await isChoosableTargetProfile(workspaceId, profile)) return
  const message = 'Choose one of the listed targets: a published one, or a custom target of this workspace.'
  throw new ValidationError(message, { targetProfile: message })
}

/** Deletes the room with its surveys and captures, and the stored files no other row uses. */
export async function deleteRoom(userId: number, roomId: number, store: ObjectStore): Promise<void> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:delete')
  await room.destroy()
  await releaseQueuedContent(store)
  await recordActivity({ workspaceId: room.workspaceId, roomId: null, userId, action: 'room.deleted', summary: `deleted the room "${room.name}"` })
}
