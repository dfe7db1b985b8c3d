import type { RoomDto } from '@shared/api'
import { formatNumber } from './formatNumber'
import { lengthFromMetres, volumeFromCubicMetres, volumeUnitLabel, type LengthUnit } from './lengthUnits'

/** The volume as a figure in m³ or ft³ ("85.4", "3,016"), without the unit; null when unknown. */
export function formatVolumeFigure(volumeM3: number | null, unit: LengthUnit): string | null {
  if (volumeM3 === null) return null
  return formatNumber(volumeFromCubicMetres(volumeM3, unit), unit === 'ft' ? 0 : 1)
}

/** "85.4 m³" or "3,016 ft³"; null when the room has no size yet. */
export function formatVolume(volumeM3: number | null, unit: LengthUnit): string | null {
  const figure = formatVolumeFigure(volumeM3, unit)
  return figure === null ? null : `${figure} ${volumeUnitLabel(unit)}`
}

/** "5.2 × 4.1 × 2.6 m" (length × width × height); null unless all three are known. */
export function formatDimensions(room: Pick<RoomDto, 'lengthM' | 'widthM' | 'heightM'>, unit: LengthUnit): string | null {
  const { lengthM, widthM, heightM } = room
  if (lengthM === null || widthM === null || heightM === null) return null
  const parts = [lengthM, widthM, heightM].map((valueM) => formatNumber(lengthFromMetres(valueM, unit), 2))
  return `${parts.join(' × ')} ${unit}`
}
