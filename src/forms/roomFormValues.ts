import { ROOM_USES, type RoomDto, type RoomUse } from '@shared/api'
import { lengthFromMetres, lengthToMetres, volumeFromCubicMetres, volumeToCubicMetres, type LengthUnit } from '@/utils/lengthUnits'
import { parseNumberInput } from '@/utils/formatNumber'

export type SizeMode = 'dimensions' | 'volume'
export type SizeField = 'length' | 'width' | 'height' | 'volume'
export const DIMENSION_FIELDS = ['length', 'width', 'height'] as const

/** What the room form holds: the text of each input, sizes in the unit the user chose. */
export interface RoomFormValues {
  name: string
  clientName: string
  address: string
  use: RoomUse | null
  sizeMode: SizeMode
  length: string
  width: string
  height: string
  volume: string
  notes: string
}

/**
 * The exact metric value behind a size shown rounded. While its text is unchanged the exact
 * value is sent, so opening a room in feet and saving it does not move it by a millimetre.
 */
export type ExactSizes = Partial<Record<SizeField, { text: string; valueSi: number }>>

export function emptyRoomFormValues(): RoomFormValues {
  // A use is required; the first one (control room) is the most common job, so it starts chosen.
  return { name: '', clientName: '', address: '', use: ROOM_USES[0], sizeMode: 'dimensions', length: '', width: '', height: '', volume: '', notes: '' }
}

/** Text for a size input: up to 3 decimals, no grouping, so it reads back as the same number. */
function sizeText(value: number): string {
  return String(Math.round(value * 1000) / 1000)
}

function fromSi(field: SizeField, valueSi: number, unit: LengthUnit): number {
  return field === 'volume' ? volumeFromCubicMetres(valueSi, unit) : lengthFromMetres(valueSi, unit)
}

export function toSi(field: SizeField, value: number, unit: LengthUnit): number {
  return field === 'volume' ? volumeToCubicMetres(value, unit) : lengthToMetres(value, unit)
}

/** The metric value of a size input: the remembered exact value, else the typed number converted. */
export function sizeInputToSi(field: SizeField, text: string, unit: LengthUnit, exact: ExactSizes): number | null {
  const remembered = exact[field]
  if (remembered && remembered.text === text) return remembered.valueSi
  const value = parseNumberInput(text)
  return value === null || Number.isNaN(value) ? null : toSi(field, value, unit)
}

function withSizes(values: RoomFormValues, sizesSi: Partial<Record<SizeField, number | null>>, unit: LengthUnit) {
  const next = { ...values }
  const exact: ExactSizes = {}
  for (const field of [...DIMENSION_FIELDS, 'volume'] as const) {
    const valueSi = sizesSi[field]
    if (valueSi === null || valueSi === undefined) continue
    next[field] = sizeText(fromSi(field, valueSi, unit))
    exact[field] = { text: next[field], valueSi }
  }
  return { values: next, exact }
}

export function roomToFormValues(room: RoomDto, unit: LengthUnit): { values: RoomFormValues; exact: ExactSizes } {
  const values: RoomFormValues = {
    ...emptyRoomFormValues(),
    name: room.name,
    clientName: room.clientName,
    address: room.address,
    use: room.use,
    sizeMode: room.volumeM3 !== null ? 'volume' : 'dimensions',
    notes: room.notes,
  }
  return withSizes(values, { length: room.lengthM, width: room.widthM, height: room.heightM, volume: room.volumeM3 }, unit)
}

/** Re-expresses every readable size in the new unit; unreadable text is left for validation to flag. */
export function convertSizeUnit(values: RoomFormValues, exact: ExactSizes, from: LengthUnit, to: LengthUnit) {
  const sizesSi: Partial<Record<SizeField, number | null>> = {}
  for (const field of [...DIMENSION_FIELDS, 'volume'] as const) sizesSi[field] = sizeInputToSi(field, values[field], from, exact)
  return withSizes(values, sizesSi, to)
}
