/**
 * Maps a room plane (u along the horizontal of the drawing, v along its vertical, metres) to SVG
 * pixels and back. v grows upwards (SVG y grows downwards), so the floor of the side view and the
 * left wall of the top view sit at the bottom of the drawing.
 */
export interface PlanTransform {
  pxPerM: number
  paddingPx: number
  spanUM: number
  spanVM: number
  widthPx: number
  heightPx: number
  toPx: (uM: number, vM: number) => { xPx: number; yPx: number }
  /** Pixel → metres, clamped to the room's span (a drag past a wall stops at the wall). */
  fromPx: (xPx: number, yPx: number) => { uM: number; vM: number }
}

export function planTransform(input: { spanUM: number; spanVM: number; pxPerM: number; paddingPx: number }): PlanTransform {
  const { spanUM, spanVM, pxPerM, paddingPx } = input
  const clamp = (value: number, max: number) => Math.min(Math.max(value, 0), max)
  return {
    pxPerM,
    paddingPx,
    spanUM,
    spanVM,
    widthPx: spanUM * pxPerM + 2 * paddingPx,
    heightPx: spanVM * pxPerM + 2 * paddingPx,
    toPx: (uM, vM) => ({ xPx: paddingPx + uM * pxPerM, yPx: paddingPx + (spanVM - vM) * pxPerM }),
    fromPx: (xPx, yPx) => ({ uM: clamp((xPx - paddingPx) / pxPerM, spanUM), vM: clamp(spanVM - (yPx - paddingPx) / pxPerM, spanVM) }),
  }
}

/**
 * One scale for the top view (length × width) and the side view (length × height), so the two
 * drawings line up along the room's length: the largest that fits the length into maxWidthPx and
 * the taller of width and height into maxHeightPx.
 */
export function fitPxPerM(room: { lengthM: number; widthM: number; heightM: number }, box: { maxWidthPx: number; maxHeightPx: number; paddingPx: number }): number {
  const byLength = (box.maxWidthPx - 2 * box.paddingPx) / room.lengthM
  const byDepth = (box.maxHeightPx - 2 * box.paddingPx) / Math.max(room.widthM, room.heightM)
  return Math.min(byLength, byDepth)
}

/** A pointer position (client pixels) → the SVG's viewBox pixels, for an SVG scaled to its box. */
export function clientToViewBox(
  client: { clientX: number; clientY: number },
  rect: { left: number; top: number; width: number; height: number },
  viewBox: { widthPx: number; heightPx: number },
): { xPx: number; yPx: number } {
  return {
    xPx: ((client.clientX - rect.left) * viewBox.widthPx) / rect.width,
    yPx: ((client.clientY - rect.top) * viewBox.heightPx) / rect.height,
  }
}
