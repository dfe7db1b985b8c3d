import { RoomModel, type Room } from '../models'
import { ValidationError } from '../errors'
import { requireRoomAccess } from '../policy/roomAccess'
import { workspaceMaterials } from './materialsService'
import type { LayoutDto, RoomModelDto, TreatmentDto } from '../../shared/api/roomModel'

function toDto(roomId: number, model: RoomModel | null): RoomModelDto {
  return { roomId, layout: model?.layout ?? null, treatment: model?.treatment ?? null, updatedAt: model?.updatedAt.toISOString() ?? null }
}

export async function getRoomModel(userId: number, roomId: number): Promise<RoomModelDto> {
  await requireRoomAccess(userId, roomId, 'room:read')
  return toDto(roomId, await RoomModel.findOne({ where: { roomId } }))
}

/** Every position must lie inside the room's box when its dimensions are known. */
function assertInsideRoom(room: Room, layout: LayoutDto): void {
  if (room.lengthM === null || room.widthM === null || room.heightM === null) return
  const fields: Record<string, string> = {}
  const check = (key: string, point: { xM: number; yM: number; zM: number }) => {
    if (point.xM > room.lengthM! || point.yM > room.widthM! || point.zM > room.heightM!) {
      fields[key] = `Outside the room (${room.lengthM} × ${room.widthM} × ${room.heightM} m).`
    }
  }
  layout.speakers.forEach((speaker, index) => check(`speakers.${index}`, speaker))
  check('listener', layout.listener)
  if (Object.keys(fields).length > 0) throw new ValidationError('A position lies outside the room.', fields)
}

async function upsert(roomId: number, change: Partial<Pick<RoomModel, 'layout' | 'treatment'>>): Promise<RoomModel> {
  const [model] = await RoomModel.findOrCreate({ where: { roomId }, defaults: { roomId, layout: null, treatment: null } })
  return model.update(change)
}

export async function saveLayout(userId: number, roomId: number, layout: LayoutDto): Promise<RoomModelDto> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:update')
  assertInsideRoom(room, layout)
  return toDto(roomId, await upsert(roomId, { layout }))
}

export async function saveTreatment(userId: number, roomId: number, treatment: TreatmentDto): Promise<RoomModelDto> {
  const { room } = await requireRoomAccess(userId, roomId, 'room:update')
  const known = new Set((await workspaceMaterials(room.workspaceId)).map((m) => m.id))
  const used = [
    ...Object.entries(treatment.surfaceMaterials).map(([key, id]) => [`surfaceMaterials.${key}`, id] as const),
    ...treatment.openings.map((o, i) => [`openings.${i}.materialId`, o.materialId] as const),
    ...treatment.absorbers.map((a, i) => [`absorbers.${i}.materialId`, a.materialId] as const),
  ]
  const unknown = used.filter(([, id]) => id !== undefined && !known.has(id))
  if (unknown.length > 0) {
    throw new ValidationError('Choose materials from the library.', Object.fromEntries(unknown.map(([key, id]) => [key, `Unknown material "${id}".`])))
  }
  return toDto(roomId, await upsert(roomId, { treatment }))
}
