import type { CreateRoomBody } from '@shared/api'
import { formatNumber } from '@/utils/formatNumber'
import { lengthFromMetres, volumeFromCubicMetres, volumeUnitLabel, type LengthUnit } from '@/utils/lengthUnits'
import { DIMENSION_FIELDS, sizeInputToSi, type ExactSizes, type RoomFormValues, type SizeField } from './roomFormValues'

/** The room as sent to the server, sizes in metres; the target profile is not edited here. */
export type RoomFormBody = Omit<CreateRoomBody, 'targetProfile'>
export type RoomFormErrors = Partial<Record<keyof RoomFormValues, string>>

// Limits of shared/api/rooms.ts, restated so the messages can speak in the user's unit.
const MAX_LENGTH_M = 200
const MAX_VOLUME_M3 = 100_000
const TEXT_LIMITS = { name: 120, clientName: 120, address: 300, notes: 5000 } as const
const LABELS: Record<SizeField, string> = { length: 'Length', width: 'Width', height: 'Height', volume: 'Volume' }

function sizeError(field: SizeField, text: string, valueSi: number | null, unit: LengthUnit): string | undefined {
  const label = LABELS[field]
  const unitLabel = field === 'volume' ? volumeUnitLabel(unit) : unit
  if (text.trim() === '') return field === 'volume' ? 'Enter the volume.' : `Enter the ${field}, or give the volume instead.`
  if (valueSi === null || !Number.isFinite(valueSi)) return `${label} must be a number, e.g. ${field === 'volume' ? '85' : '4.2'}.`
  if (valueSi <= 0) return `${label} must be more than 0 ${unitLabel}.`
  const maxSi = field === 'volume' ? MAX_VOLUME_M3 : MAX_LENGTH_M
  if (valueSi > maxSi) {
    const max = field === 'volume' ? volumeFromCubicMetres(maxSi, unit) : lengthFromMetres(maxSi, unit)
    return `${label} must be at most ${formatNumber(Math.floor(max), 0)} ${unitLabel}.`
  }
  return undefined
}

/**
 * Checks the room form and builds the request body. A room needs a name, a use, and either all
 * three dimensions (each more than 0) or a volume; sizes are converted to metres here.
 */
export function validateRoomForm(values: RoomFormValues, unit: LengthUnit, exact: ExactSizes = {}): { body: RoomFormBody | null; errors: RoomFormErrors } {
  const errors: RoomFormErrors = {}
  if (values.name.trim() === '') errors.name = 'Name the room.'
  if (values.use === null) errors.use = 'Choose what the room is used for.'
  for (const field of ['name', 'clientName', 'address', 'notes'] as const) {
    const limit = TEXT_LIMITS[field]
    if (!errors[field] && values[field].trim().length > limit) errors[field] = `Keep this under ${formatNumber(limit, 0)} characters.`
  }
  const sizeFields: readonly SizeField[] = values.sizeMode === 'volume' ? ['volume'] : DIMENSION_FIELDS
  const sizesSi: Partial<Record<SizeField, number | null>> = {}
  for (const field of sizeFields) {
    sizesSi[field] = sizeInputToSi(field, values[field], unit, exact)
    const error = sizeError(field, values[field], sizesSi[field] ?? null, unit)
    if (error) errors[field] = error
  }
  if (Object.keys(errors).length > 0 || values.use === null) return { body: null, errors }
  return {
    body: {
      name: values.name.trim(),
      clientName: values.clientName.trim(),
      address: values.address.trim(),
      use: values.use,
      lengthM: sizesSi.length ?? null,
      widthM: sizesSi.width ?? null,
      heightM: sizesSi.height ?? null,
      volumeM3: sizesSi.volume ?? null,
      notes: values.notes.trim(),
    },
    errors,
  }
}

const SERVER_FIELD_NAMES: Record<string, keyof RoomFormValues> = { lengthM: 'length', widthM: 'width', heightM: 'height', volumeM3: 'volume' }

/** Puts the server's field messages (keyed by body field, e.g. `lengthM`) onto the form inputs. */
export function serverFieldsToRoomForm(fields: Record<string, string>): RoomFormErrors {
  const errors: RoomFormErrors = {}
  const known = new Set(['name', 'clientName', 'address', 'use', 'notes'])
  for (const [key, message] of Object.entries(fields)) {
    const field = SERVER_FIELD_NAMES[key] ?? (known.has(key) ? (key as keyof RoomFormValues) : undefined)
    if (field) errors[field] = message
  }
  return errors
}
