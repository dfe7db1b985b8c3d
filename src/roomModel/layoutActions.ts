import type { LayoutDto } from '@shared/api'
import { listeningDistanceM, SEATED_EAR_HEIGHT_M, stereoTriangleListener, THIRTY_EIGHT_PERCENT_RULE, type RoomDimensions } from '@shared/room'
import { clampToRoom, roundToMillimetre } from './clampToRoom'
import { defaultBaseWidthM, triangleSpeakers } from './defaultLayout'

/** Mean horizontal speaker-to-listener distance, m (null without speakers). */
export function meanListeningDistanceM(layout: LayoutDto): number | null {
  if (layout.speakers.length === 0) return null
  return layout.speakers.reduce((sum, s) => sum + listeningDistanceM(s, layout.listener), 0) / layout.speakers.length
}

/** Keeps the listener and moves the first two speakers to an equilateral triangle at the current mean listening distance. */
export function equilateralSpeakers(layout: LayoutDto, room: RoomDimensions): LayoutDto {
  const distanceM = meanListeningDistanceM(layout)
  const baseWidthM = distanceM && distanceM > 0.1 ? distanceM : defaultBaseWidthM(room, layout.listener)
  const [left, right] = triangleSpeakers(layout.listener, baseWidthM, room)
  const labels = [layout.speakers[0]?.label ?? 'Left', layout.speakers[1]?.label ?? 'Right']
  return { ...layout, speakers: [{ ...left!, label: labels[0]! }, { ...right!, label: labels[1]! }, ...layout.speakers.slice(2)] }
}

/** Keeps the first two speakers and moves the listener to the apex of their equilateral triangle. */
export function equilateralListener(layout: LayoutDto, room: RoomDimensions): LayoutDto {
  const [left, right] = layout.speakers
  if (!left || !right) return layout
  const ordered = left.yM <= right.yM ? { left, right } : { left: right, right: left }
  return { ...layout, listener: clampToRoom(stereoTriangleListener(ordered), room) }
}

/** Tweeters and ears at seated ear height, 1.2 m (common practice), or the ceiling if lower. */
export function atEarHeight(layout: LayoutDto, room: RoomDimensions, earHeightM = SEATED_EAR_HEIGHT_M): LayoutDto {
  const zM = roundToMillimetre(Math.min(earHeightM, room.heightM))
  return { ...layout, listener: { ...layout.listener, zM }, speakers: layout.speakers.map((s) => ({ ...s, zM })) }
}

/** Listener at 0.38·L from the front wall (the 38 % position, common practice), y and z kept. */
export function listenerAtThirtyEightPercent(layout: LayoutDto, room: RoomDimensions): LayoutDto {
  return { ...layout, listener: clampToRoom({ ...layout.listener, xM: THIRTY_EIGHT_PERCENT_RULE * room.lengthM }, room) }
}
