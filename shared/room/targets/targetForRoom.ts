import { ansiS1260Mask } from './ansiS1260'
import { din18041Mask } from './din18041'
import { ebuTech3276Mask } from './ebuTech3276'
import { smallStudioCommonPracticeMask } from './smallStudioCommonPractice'
import type { TargetMask } from './targetMask'

export type RoomUse = 'control-room' | 'mixing-room' | 'home-theatre' | 'rehearsal-room' | 'classroom' | 'other'

export type TargetId =
  | 'ebu-tech-3276'
  | 'din-18041-a1'
  | 'din-18041-a2'
  | 'din-18041-a3'
  | 'din-18041-a4'
  | 'din-18041-a5'
  | 'ansi-s12-60'
  | 'small-studio-common-practice'

export const TARGET_IDS: readonly TargetId[] = [
  'ebu-tech-3276',
  'din-18041-a1',
  'din-18041-a2',
  'din-18041-a3',
  'din-18041-a4',
  'din-18041-a5',
  'ansi-s12-60',
  'small-studio-common-practice',
]

/** Octave centres 63 Hz–8 kHz (IEC 61260-1 nominal). */
export const OCTAVE_CENTRES_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const

/** Nominal third-octave centres 50 Hz–10 kHz (IEC 61260-1 Annex E). */
export const THIRD_OCTAVE_CENTRES_HZ = [
  50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000, 6300, 8000, 10000,
] as const

/**
 * Default target for a room use: listening-type rooms (control, mixing, home theatre) take the
 * EBU Tech 3276 reference-room mask; a rehearsal room DIN 18041 A1 (music); a classroom DIN 18041
 * A3 (teaching); anything else the small-studio common-practice band. (Our mapping, a choice the
 * user can override with the room's target profile.)
 */
export function defaultTargetId(use: RoomUse): TargetId {
  switch (use) {
    case 'control-room':
    case 'mixing-room':
    case 'home-theatre':
      return 'ebu-tech-3276'
    case 'rehearsal-room':
      return 'din-18041-a1'
    case 'classroom':
      return 'din-18041-a3'
    case 'other':
      return 'small-studio-common-practice'
  }
}

/** The published and common-practice targets a room can choose, with their names for pickers. */
export const TARGET_LABELS: Record<TargetId, string> = {
  'ebu-tech-3276': 'Reference listening room (EBU Tech 3276 / ITU-R BS.1116)',
  'din-18041-a1': 'DIN 18041 group A1 (music)',
  'din-18041-a2': 'DIN 18041 group A2 (speech / lecture)',
  'din-18041-a3': 'DIN 18041 group A3 (teaching / communication)',
  'din-18041-a4': 'DIN 18041 group A4 (teaching, inclusive)',
  'din-18041-a5': 'DIN 18041 group A5 (sport)',
  'ansi-s12-60': 'Core learning space (ANSI/ASA S12.60)',
  'small-studio-common-practice': 'Small studio (common practice)',
}

export function isTargetId(value: string): value is TargetId {
  return (TARGET_IDS as readonly string[]).includes(value)
}

/** Builds the target mask for a room: explicit targetId if given, else the default for its use. */
export function targetForRoom(room: { use: RoomUse; volumeM3: number; targetId?: TargetId }, bandsHz: readonly number[] = OCTAVE_CENTRES_HZ): TargetMask {
  const id = room.targetId ?? defaultTargetId(room.use)
  if (id === 'ebu-tech-3276') return ebuTech3276Mask(room.volumeM3, bandsHz)
  if (id === 'ansi-s12-60') return ansiS1260Mask(room.volumeM3, bandsHz)
  if (id === 'small-studio-common-practice') return smallStudioCommonPracticeMask(bandsHz)
  const group = id.slice('din-18041-'.length).toUpperCase() as 'A1' | 'A2' | 'A3' | 'A4' | 'A5'
  return din18041Mask(group, room.volumeM3, bandsHz)
}
