import { createCaptureFieldsSchema, type CreateCaptureFields } from '@shared/api'
import type { CaptureKind } from '@shared/types/analysis'
import { parseNumberInput } from '@/utils/formatNumber'
import { zodFieldErrors } from './zodFieldErrors'

/** The text of each field of one file waiting to be uploaded. */
export interface CaptureDraftFields {
  kind: CaptureKind
  channel: string
  sourceLabel: string
  receiverLabel: string
  positionXM: string
  positionYM: string
  positionZM: string
  sweepF1Hz: string
  sweepF2Hz: string
  sweepDurationS: string
}
export type CaptureDraftErrors = Partial<Record<keyof CaptureDraftFields | 'file', string>>

const NUMBER_FIELDS = ['channel', 'positionXM', 'positionYM', 'positionZM', 'sweepF1Hz', 'sweepF2Hz', 'sweepDurationS'] as const

/** Ear height of a seated listener, m: ISO 3382-1:2009 cl. 5.2 places receivers 1.2 m above the floor. */
export const DEFAULT_RECEIVER_HEIGHT_M = '1.2'

/** True for names and types a WAV file is sent with. */
export function isWavFile(file: Pick<File, 'name' | 'type'>): boolean {
  return /\.wav$/i.test(file.name) || /^audio\/(x-)?(wav|wave)$/i.test(file.type)
}

/**
 * Fields prefilled for the n-th file (1-based): receiver "Position n", impulse unless the name
 * says sweep, channel 0, receiver height 1.2 m, and the test sweep's parameters (20 Hz – 20 kHz, 6 s).
 */
export function defaultCaptureDraftFields(fileName: string, positionNumber: number, previous?: CaptureDraftFields): CaptureDraftFields {
  return {
    kind: /sweep/i.test(fileName) ? 'sweep' : 'impulse',
    channel: previous?.channel ?? '0',
    sourceLabel: previous?.sourceLabel ?? 'Source 1',
    receiverLabel: `Position ${positionNumber}`,
    positionXM: '',
    positionYM: '',
    positionZM: previous?.positionZM ?? DEFAULT_RECEIVER_HEIGHT_M,
    sweepF1Hz: previous?.sweepF1Hz ?? '20',
    sweepF2Hz: previous?.sweepF2Hz ?? '20000',
    sweepDurationS: previous?.sweepDurationS ?? '6',
  }
}

/**
 * Checks one file's fields with the API's own schema (shared/api/captures.ts). A sweep needs its
 * three parameters unless a reference sweep file goes with it.
 */
export function validateCaptureDraft(fields: CaptureDraftFields, hasReference: boolean): { body: CreateCaptureFields | null; errors: CaptureDraftErrors } {
  const errors: CaptureDraftErrors = {}
  for (const name of NUMBER_FIELDS) {
    if (Number.isNaN(parseNumberInput(fields[name]))) errors[name] = 'Type a number, e.g. 1.5.'
  }
  const isSweep = fields.kind === 'sweep'
  if (isSweep && !hasReference) {
    for (const name of ['sweepF1Hz', 'sweepF2Hz', 'sweepDurationS'] as const) {
      if (fields[name].trim() === '') errors[name] ??= 'A sweep needs this, or a reference sweep file.'
    }
  }
  const normalised = Object.fromEntries(Object.entries(fields).map(([key, value]) => [key, typeof value === 'string' ? value.trim().replace(',', '.') : value]))
  if (!isSweep) Object.assign(normalised, { sweepF1Hz: '', sweepF2Hz: '', sweepDurationS: '' })
  const parsed = createCaptureFieldsSchema.safeParse(normalised)
  if (!parsed.success) Object.assign(errors, { ...zodFieldErrors<keyof CaptureDraftFields>(parsed.error), ...errors })
  return Object.keys(errors).length > 0 || !parsed.success ? { body: null, errors } : { body: parsed.data, errors }
}

/** The multipart body of the upload: fields as strings, blanks left out. */
export function captureFormData(body: CreateCaptureFields, file: File, reference: File | null): FormData {
  const form = new FormData()
  for (const [name, value] of Object.entries(body)) {
    if (value !== null && value !== '') form.append(name, String(value))
  }
  if (reference && body.kind === 'sweep') form.append('reference', reference)
  form.append('file', file)
  return form
}
