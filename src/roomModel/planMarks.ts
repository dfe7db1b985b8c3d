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

/** Where a point's label goes: inside the room, away from the wall the point lies on. */
export function reflectionLabelPlacement(surface: RoomBoundary): { dxPx: number; dyPx: number; anchor: 'start' | 'end' } {
  switch (surface) {
    case 'front wall':
      return { dxPx: 8, dyPx: 4, anchor: 'start' }
    case 'rear wall':
      return { dxPx: -8, dyPx: 4, anchor: 'end' }
    case 'left side wall':
    case 'floor':
      return { dxPx: 0, dyPx: -9, anchor: 'start' }
    case 'right side wall':
    case 'ceiling':
      return { dxPx: 0, dyPx: 16, anchor: 'start' }
  }
}

/**
 * One label for points drawn on top of each other (a symmetric layout puts both speakers'
 * ceiling points in one place in the side view): "L·ceiling" + "R·ceiling" → "L/R·ceiling" on
 * the first, an empty label on the others. Points closer than tolerancePx count as one place.
 */
export function mergeCoincidentLabels(points: readonly { xPx: number; yPx: number; label: string }[], tolerancePx = 6): string[] {
  const labels = points.map((p) => p.label)
  points.forEach((p, i) => {
    const first = points.findIndex((q) => Math.hypot(q.xPx - p.xPx, q.yPx - p.yPx) < tolerancePx)
    if (first === i) return
    const [initial, surface] = p.label.split('·')
    const [firstInitials, firstSurface] = (labels[first] ?? '').split('·')
    labels[first] = firstSurface === surface ? `${firstInitials}/${initial}·${surface}` : `${labels[first]}, ${p.label}`
    labels[i] = ''
  })
  return labels
}

/** Approximate width of a 10 px label character, px (Noto Sans averages a little over half the size). */
const LABEL_CHAR_PX = 6

/**
 * How many rows inwards each label moves so that labels on one wall do not overlap: a label
 * takes the next free row when an earlier label on the same line would run into it.
 */
export function labelRows(labels: readonly { xPx: number; yPx: number; text: string }[]): number[] {
  const rows: number[] = []
  labels.forEach((label, i) => {
    const taken = new Set<number>()
    for (let j = 0; j < i; j++) {
      const other = labels[j]!
      if (!other.text || Math.abs(other.yPx - label.yPx) > 4) continue
      const widthPx = Math.max(other.text.length, label.text.length) * LABEL_CHAR_PX
      if (Math.abs(other.xPx - label.xPx) < widthPx) taken.add(rows[j]!)
    }
    let row = 0
    while (taken.has(row)) row += 1
    rows.push(row)
  })
  return rows
}
