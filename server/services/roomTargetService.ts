import { CustomTarget, type Room } from '../models'
import { customTargetMask } from '../../shared/room/targets/customTargetMask'
import { parseRoomTargetChoice } from '../../shared/room/targets/roomTargetChoice'
import { defaultTargetId, OCTAVE_CENTRES_HZ, TARGET_IDS, TARGET_LABELS, targetForRoom, THIRD_OCTAVE_CENTRES_HZ } from '../../shared/room/targets/targetForRoom'
import { TARGET_GENERAL_CAUTION, targetCitationText } from '../../shared/room/targets/targetCitationText'
import type { TargetMask } from '../../shared/room/targets/targetMask'
import type { RoomTargetDto, TargetOptionDto } from '../../shared/api/targets'
import type { BandResolution } from '../../shared/types/analysis'

export const bandCentresOf = (bands: BandResolution) => (bands === 'octave' ? OCTAVE_CENTRES_HZ : THIRD_OCTAVE_CENTRES_HZ)

/** The custom target a profile names, if it belongs to the room's workspace. */
async function customTargetOf(room: Pick<Room, 'workspaceId'>, customTargetId: number): Promise<CustomTarget | null> {
  return CustomTarget.findOne({ where: { id: customTargetId, workspaceId: room.workspaceId } })
}

export function customTargetDefinition(target: CustomTarget) {
  return { id: target.id, name: target.name, sourceNote: target.sourceNote, octaveLimits: target.octaveLimits }
}

/**
 * The mask a room is judged by at a band resolution: its custom target, the published target it
 * chose, or the default for its use. Published formulas need the volume: null without one (or
 * outside the formula's range); a custom target needs no volume.
 */
export async function roomTargetMask(room: Room, bands: BandResolution): Promise<TargetMask | null> {
  const choice = parseRoomTargetChoice(room.targetProfile) ?? { kind: 'auto' as const }
  if (choice.kind === 'custom') {
    const custom = await customTargetOf(room, choice.customTargetId)
    if (custom) return customTargetMask(customTargetDefinition(custom), bandCentresOf(bands))
  }
  const volumeM3 = room.effectiveVolumeM3()
  if (volumeM3 === null) return null
  try {
    return targetForRoom({ use: room.use, volumeM3, ...(choice.kind === 'published' ? { targetId: choice.targetId } : {}) }, bandCentresOf(bands))
  } catch {
    return null
  }
}

/** The room's target as the room page and the verdicts name it. */
export async function describeRoomTarget(room: Room): Promise<RoomTargetDto> {
  const mask = await roomTargetMask(room, 'octave')
  const fallbackId = defaultTargetId(room.use)
  const chosen = parseRoomTargetChoice(room.targetProfile)
  const id = mask?.id ?? (chosen?.kind === 'published' ? chosen.targetId : fallbackId)
  const labelled = mask ?? { name: TARGET_LABELS[id as keyof typeof TARGET_LABELS] ?? id, kind: 'published' as const, citation: null, sourceNote: null }
  return {
    targetProfile: room.targetProfile,
    id,
    name: labelled.name,
    kind: labelled.kind,
    citation: labelled.citation,
    sourceNote: labelled.sourceNote,
    citationText: mask ? targetCitationText(mask) : 'Give the room its dimensions or volume to compute this target.',
    caution: TARGET_GENERAL_CAUTION,
    octaveBands: mask ? mask.bands.map(({ centreHz, minS, maxS }) => ({ centreHz, minS, maxS })) : null,
  }
}

/** Every target a room of the workspace can choose: the published ones and the workspace's own. */
export async function targetOptions(workspaceId: number, volumeM3ForCitation = 100): Promise<TargetOptionDto[]> {
  const published = TARGET_IDS.map((targetId) => {
    const mask = targetForRoom({ use: 'other', volumeM3: volumeM3ForCitation, targetId })
    return { targetProfile: targetId, name: TARGET_LABELS[targetId], kind: mask.kind, citationText: targetCitationText(mask) }
  })
  const custom = await CustomTarget.findAll({ where: { workspaceId }, order: [['name', 'ASC']] })
  return [
    ...published,
    ...custom.map((target) => ({ targetProfile: `custom:${target.id}`, name: target.name, kind: 'custom' as const, citationText: targetCitationText({ kind: 'custom', citation: null, sourceNote: target.sourceNote }) })),
  ]
}

/** Whether a profile names a target this workspace may choose ('auto', a published id, or its own custom target). */
export async function isChoosableTargetProfile(workspaceId: number, profile: string): Promise<boolean> {
  const choice = parseRoomTargetChoice(profile)
  if (!choice) return false
  if (choice.kind !== 'custom') return true
  return (await customTargetOf({ workspaceId }, choice.customTargetId)) !== null
}
