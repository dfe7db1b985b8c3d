import type { RoomMode } from './roomModes'

export interface ModeCoincidenceOptions {
  /** Modes within this many Hz of their neighbour are grouped (default 0 = exact, to 1e−6 Hz). */
  toleranceHz?: number
  /** Or within this percentage of the lower frequency; the wider of the two applies. */
  tolerancePercent?: number
}

export interface ModeCoincidence {
  /** Mean frequency of the group, Hz. */
  frequencyHz: number
  modes: RoomMode[]
}

/**
 * Groups of two or more modes whose frequencies coincide within a tolerance (chained: each mode
 * is compared with the previous one in frequency order). Coinciding modes reinforce one
 * another and stand out in the bass (Handbook for Sound Engineers ch. 6, Table 6-4 discussion).
 */
export function findModeCoincidences(modes: readonly RoomMode[], options: ModeCoincidenceOptions = {}): ModeCoincidence[] {
  const { toleranceHz = 0, tolerancePercent = 0 } = options
  const sorted = [...modes].sort((a, b) => a.frequencyHz - b.frequencyHz)
  const groups: RoomMode[][] = []
  let current: RoomMode[] = []
  for (const mode of sorted) {
    const previous = current[current.length - 1]
    const allowedHz = previous ? Math.max(toleranceHz, (previous.frequencyHz * tolerancePercent) / 100, 1e-6) : 0
    if (previous && mode.frequencyHz - previous.frequencyHz <= allowedHz) {
      current.push(mode)
    } else {
      if (current.length > 1) groups.push(current)
      current = [mode]
    }
  }
  if (current.length > 1) groups.push(current)
  return groups.map((group) => ({
    frequencyHz: group.reduce((sum, mode) => sum + mode.frequencyHz, 0) / group.length,
    modes: group,
  }))
}
