import { sweepQuerySchema } from '@shared/api'
import type { SweepParameters } from '@/api/testSignal'
import { parseNumberInput } from '@/utils/formatNumber'

/** The text of each field of the test-signal form. */
export interface TestSignalFormValues {
  f1Hz: string
  f2Hz: string
  durationS: string
  sampleRateHz: string
  levelDb: string
}
export type TestSignalFormErrors = Partial<Record<keyof TestSignalFormValues, string>>

/** Defaults of the sweep endpoint: 20 Hz – 20 kHz over 6 s at 48 kHz, −12 dBFS (start low). */
export const DEFAULT_TEST_SIGNAL_VALUES: TestSignalFormValues = { f1Hz: '20', f2Hz: '20000', durationS: '6', sampleRateHz: '48000', levelDb: '-12' }

/** Form field ↔ query parameter of GET /api/test-signal/sweep.wav. */
const QUERY_NAMES = { f1Hz: 'f1', f2Hz: 'f2', durationS: 'seconds', sampleRateHz: 'rate', levelDb: 'levelDb' } as const

/** Checks the form with the endpoint's own schema (shared/api/results.ts), so the messages match the server's. */
export function validateTestSignalForm(values: TestSignalFormValues): { parameters: SweepParameters | null; errors: TestSignalFormErrors } {
  const errors: TestSignalFormErrors = {}
  const numbers = {} as Record<keyof TestSignalFormValues, number>
  for (const field of Object.keys(QUERY_NAMES) as (keyof TestSignalFormValues)[]) {
    const value = parseNumberInput(values[field].replace('−', '-'))
    if (value === null || Number.isNaN(value)) errors[field] = 'Type a number.'
    else numbers[field] = value
  }
  if (Object.keys(errors).length > 0) return { parameters: null, errors }
  const parsed = sweepQuerySchema.safeParse(Object.fromEntries(Object.entries(QUERY_NAMES).map(([field, name]) => [name, numbers[field as keyof TestSignalFormValues]])))
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = (Object.keys(QUERY_NAMES) as (keyof TestSignalFormValues)[]).find((f) => QUERY_NAMES[f] === issue.path[0])
      if (field && !errors[field]) errors[field] = issue.message
    }
    return { parameters: null, errors }
  }
  const q = parsed.data
  return { parameters: { f1Hz: q.f1, f2Hz: q.f2, durationS: q.seconds, sampleRateHz: q.rate, levelDb: q.levelDb }, errors }
}
