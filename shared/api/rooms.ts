import { z } from 'zod'
import type { Role } from './common'
import type { RoomTargetDto } from './targets'

export const ROOM_USES = [
  'control-room',
  'mixing-room',
  'home-theatre',
  'rehearsal-room',
  'classroom',
  'other',
] as const
export const roomUseSchema = z.enum(ROOM_USES)
export type RoomUse = z.infer<typeof roomUseSchema>

export const ROOM_USE_LABELS: Record<RoomUse, string> = {
  'control-room': 'Control room',
  'mixing-room': 'Mixing room',
  'home-theatre': 'Home theatre',
  'rehearsal-room': 'Rehearsal room',
  classroom: 'Classroom',
  other: 'Other',
}

/** Dimensions are stored in metres; the client converts feet before sending. */
const metres = (label: string) =>
  z
    .number({ error: `${label} must be a number of metres.` })
    .positive(`${label} must be more than 0 m.`)
    .max(200, `${label} must be at most 200 m.`)

const roomFields = {
  name: z.string().trim().min(1, 'Name the room.').max(120),
  clientName: z.string().trim().max(120).default(''),
  address: z.string().trim().max(300).default(''),
  use: roomUseSchema,
  lengthM: metres('Length').nullable().default(null),
  widthM: metres('Width').nullable().default(null),
  heightM: metres('Height').nullable().default(null),
  /** For irregular rooms: a given volume instead of L×W×H. */
  volumeM3: z.number().positive('Volume must be more than 0 m³.').max(100_000).nullable().default(null),
  targetProfile: z.string().trim().max(60).default('auto'),
  notes: z.string().max(5000).default(''),
}

/** A room needs either all three dimensions or a volume. */
function hasSize(room: { lengthM: number | null; widthM: number | null; heightM: number | null; volumeM3: number | null }) {
  const hasAllDimensions = room.lengthM !== null && room.widthM !== null && room.heightM !== null
  return hasAllDimensions || room.volumeM3 !== null
}

export const createRoomBodySchema = z
  .object(roomFields)
  .refine(hasSize, { message: 'Give length, width and height, or a volume.', path: ['lengthM'] })
export type CreateRoomBody = z.infer<typeof createRoomBodySchema>

export const updateRoomBodySchema = z
  .object({
    name: roomFields.name,
    clientName: z.string().trim().max(120),
    address: z.string().trim().max(300),
    use: roomUseSchema,
    lengthM: metres('Length').nullable(),
    widthM: metres('Width').nullable(),
    heightM: metres('Height').nullable(),
    volumeM3: z.number().positive('Volume must be more than 0 m³.').max(100_000).nullable(),
    targetProfile: z.string().trim().max(60),
    notes: z.string().max(5000),
  })
  .partial()
  .refine((body) => Object.keys(body).length > 0, { message: 'Nothing to change.' })
export type UpdateRoomBody = z.infer<typeof updateRoomBodySchema>

export const listRoomsQuerySchema = z.object({
  search: z.string().trim().max(120).optional(),
})

export interface RoomDto {
  id: number
  workspaceId: number
  name: string
  clientName: string
  address: string
  use: RoomUse
  lengthM: number | null
  widthM: number | null
  heightM: number | null
  volumeM3: number | null
  /** The volume used for calculations: given volume, else L×W×H. */
  effectiveVolumeM3: number | null
  targetProfile: string
  /** The target in force, as the room page and every verdict name it. */
  target: RoomTargetDto
  notes: string
  surveyCount: number
  lastSurveyOn: string | null
  createdAt: string
  updatedAt: string
  /** What the caller may do with this room. */
  permissions: RoomPermissions
}

export interface RoomPermissions {
  role: Role
  canEdit: boolean
  canDelete: boolean
  canShare: boolean
  canAddCaptures: boolean
  /** Start analyses, pin the analysis that counts, include or exclude captures (owners, engineers). */
  canJudgeCaptures: boolean
}

export const shareRoomBodySchema = z.object({
  email: z.email('Enter a valid e-mail address.').trim().toLowerCase(),
})
export type ShareRoomBody = z.infer<typeof shareRoomBodySchema>

export interface RoomShareDto {
  userId: number
  name: string
  email: string
  role: Role
}
