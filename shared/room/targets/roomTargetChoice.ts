import { isTargetId, type TargetId } from './targetForRoom'

/**
 * What a room's target profile says: 'auto' (the default for its use), a published target id, or
 * a custom target of the workspace as "custom:<id>".
 */
export type RoomTargetChoice = { kind: 'auto' } | { kind: 'published'; targetId: TargetId } | { kind: 'custom'; customTargetId: number }

export function parseRoomTargetChoice(profile: string): RoomTargetChoice | null {
  if (profile === 'auto') return { kind: 'auto' }
  if (isTargetId(profile)) return { kind: 'published', targetId: profile }
  const custom = /^custom:([1-9]\d{0,9})$/.exec(profile)
  if (custom) return { kind: 'custom', customTargetId: Number(custom[1]) }
  return null
}

export function roomTargetChoiceToProfile(choice: RoomTargetChoice): string {
  if (choice.kind === 'auto') return 'auto'
  if (choice.kind === 'published') return choice.targetId
  return `custom:${choice.customTargetId}`
}
