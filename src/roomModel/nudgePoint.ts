import type { RoomDimensions, RoomPoint } from '@shared/room'
import { clampToRoom } from './clampToRoom'

/** Which drawing the focused handle is in: the top view shows x–y, the side view x–z. */
export type PlanViewKind = 'top' | 'side'

/** One arrow-key press moves a handle this far, m (Shift: the fine step). */
export const NUDGE_STEP_M = 0.05
export const FINE_NUDGE_STEP_M = 0.01

/**
 * The point after an arrow key on a handle, or null for any other key. Left/right move along the
 * length (x) in both views, as the views share that axis; up/down move across the width (y) in
 * the top view, where the left wall is drawn at the bottom, and in height (z) in the side view.
 * The result stays inside the room.
 */
export function nudgePoint<T extends RoomPoint>(point: T, key: string, view: PlanViewKind, room: RoomDimensions, stepM = NUDGE_STEP_M): T | null {
  const vertical = view === 'top' ? 'yM' : 'zM'
  const moves: Record<string, ['xM' | 'yM' | 'zM', number]> = {
    ArrowLeft: ['xM', -stepM],
    ArrowRight: ['xM', stepM],
    ArrowUp: [vertical, stepM],
    ArrowDown: [vertical, -stepM],
  }
  const move = moves[key]
  if (!move) return null
  const [axis, deltaM] = move
  return clampToRoom({ ...point, [axis]: point[axis] + deltaM }, room)
}
