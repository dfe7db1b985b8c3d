import { z } from 'zod'
import { OCTAVE_CENTRES_HZ } from '../room/targets/targetForRoom'
import type { TargetCitation, TargetKind } from '../room/targets/targetMask'

const seconds = z.number({ error: 'Limits are numbers of seconds.' }).positive('A limit is more than 0 s.').max(20, 'A limit is at most 20 s.').nullable()

export const customTargetBodySchema = z
  .object({
    name: z.string().trim().min(1, 'Name the target.').max(80, 'Keep the name under 80 characters.'),
    sourceNote: z.string().trim().min(3, 'Say where the limits come from (a brief, a standard and its clause, a client requirement).').max(500),
    octaveLimits: z
      .array(z.object({ centreHz: z.number(), minS: seconds, maxS: seconds }))
      .length(OCTAVE_CENTRES_HZ.length, `Give limits for the ${OCTAVE_CENTRES_HZ.length} octave bands 63 Hz–8 kHz.`),
  })
  .superRefine((body, ctx) => {
    body.octaveLimits.forEach((band, i) => {
      if (band.centreHz !== OCTAVE_CENTRES_HZ[i]) ctx.addIssue({ code: 'custom', path: ['octaveLimits', i, 'centreHz'], message: `Band ${i + 1} must be ${OCTAVE_CENTRES_HZ[i]} Hz.` })
      if (band.minS !== null && band.maxS !== null && band.minS >= band.maxS) {
        ctx.addIssue({ code: 'custom', path: ['octaveLimits', i, 'maxS'], message: `At ${band.centreHz} Hz the upper limit must be above the lower one.` })
      }
    })
    if (body.octaveLimits.every((band) => band.minS === null && band.maxS === null)) {
      ctx.addIssue({ code: 'custom', path: ['octaveLimits'], message: 'Give at least one limit.' })
    }
  })
export type CustomTargetBody = z.infer<typeof customTargetBodySchema>

export interface CustomTargetDto extends CustomTargetBody {
  id: number
  workspaceId: number
  createdAt: string
  updatedAt: string
}

/** "auto", a published target id, or "custom:<id>". */
export const setRoomTargetBodySchema = z.object({
  targetProfile: z.string({ error: 'Choose a target.' }).trim().min(1, 'Choose a target.').max(60),
})

/** The room's chosen target as the room page shows it. */
export interface RoomTargetDto {
  /** What is stored: "auto", a published id or "custom:<id>". */
  targetProfile: string
  /** The target in force (for "auto": the default for the room's use). */
  id: string
  name: string
  kind: TargetKind
  citation: TargetCitation | null
  sourceNote: string | null
  /** Plain text for a client: the citation, or the custom source note. */
  citationText: string
  /** The general caution every verdict carries. */
  caution: string
  /** Octave limits in force (null limits = no limit), or null when the room has no volume yet. */
  octaveBands: { centreHz: number; minS: number | null; maxS: number | null }[] | null
}

/** One choice of the target picker. */
export interface TargetOptionDto {
  targetProfile: string
  name: string
  kind: TargetKind
  citationText: string
}
