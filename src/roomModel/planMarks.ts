import type { PredictedReflection, RoomBoundary } from '@shared/room'
import type { PlanViewKind } from './nudgePoint'

const SHORT_SURFACE: Record<RoomBoundary, string> = {
  'front wall': 'front',
  'rear wall': 'rear',
  'left side wall': 'left',
  'right side wall': 'right',
  floor: 'floor',
  ceiling: 'ceiling',
}

/**
 * The drawing a reflection point is drawn in, each point once: wall points lie on the outline of
 * the top view (x–y); floor and ceiling points on the outline of the side view (x–z).
 */
export function reflectionView(surface: RoomBoundary): PlanViewKind {
  return surface === 'floor' || surface === 'ceiling' ? 'side' : 'top'
}

/** Short label beside a point: the speaker's initial and the surface, e.g. "L·left". */
export function reflectionLabel(reflection: Pick<PredictedReflection, 'speaker' | 'surface'>): string {
  return `${reflection.speaker.slice(0, 1).toUpperCase()}·${SHORT_SURFACE[reflection.surface]}`
}

/** A point's coordinates in a drawing's own plane: (x, y) in the top view, (x, z) in the side view. */
export function planeCoordinates(point: { xM: number; yM: number; zM: number }, view: PlanViewKind): { uM: number; vM: number } {
  return { uM: point.xM, vM: view === 'top' ? point.yM : point.zM }
}

/** The inverse: a drawing's plane coordinates written back into the point's own axes. */
export function withPlaneCoordinates<T extends { xM: number; yM: number; zM: number }>(point: T, view: PlanViewKind, plane: { uM: number; vM: number }): T {
  return view === 'top' ? { ...point, xM: plane.uM, yM: plane.vM } : { ...point, xM: plane.uM, zM: plane.vM }
}
