import { customTargetBodySchema, type CustomTargetBody } from '@shared/api'
import { OCTAVE_CENTRES_HZ } from '@shared/room'
import { parseNumberInput } from '@/utils/formatNumber'

/** The custom-target form: the text of each input, one lower and one upper limit per octave. */
export interface CustomTargetFormValues {
  name: string
  sourceNote: string
  limits: { centreHz: number; minS: string; maxS: string }[]
}

export function emptyCustomTargetForm(): CustomTargetFormValues {
  return { name: '', sourceNote: '', limits: OCTAVE_CENTRES_HZ.map((centreHz) => ({ centreHz, minS: '', maxS: '' })) }
}

/** Checks the form with the API's own schema; an empty limit means "no limit on that side". */
export function validateCustomTargetForm(values: CustomTargetFormValues): { body: CustomTargetBody | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {}
  const number = (text: string, key: string) => {
    const value = parseNumberInput(text)
    if (Number.isNaN(value)) errors[key] = 'A limit is a number of seconds, e.g. 0.3.'
    return Number.isNaN(value) ? null : value
  }
  const octaveLimits = values.limits.map((band, i) => ({ centreHz: band.centreHz, minS: number(band.minS, `octaveLimits.${i}.minS`), maxS: number(band.maxS, `octaveLimits.${i}.maxS`) }))
  const parsed = customTargetBodySchema.safeParse({ name: values.name, sourceNote: values.sourceNote, octaveLimits })
  if (!parsed.success) for (const issue of parsed.error.issues) errors[issue.path.join('.')] ??= issue.message
  return Object.keys(errors).length > 0 || !parsed.success ? { body: null, errors } : { body: parsed.data, errors }
}
