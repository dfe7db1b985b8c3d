import type { z } from 'zod'

/** The first message of each top-level field of a failed zod parse. */
export function zodFieldErrors<T extends string>(error: z.ZodError): Partial<Record<T, string>> {
  const errors: Partial<Record<T, string>> = {}
  for (const issue of error.issues) {
    const field = issue.path[0]
    if (typeof field === 'string' && !errors[field as T]) errors[field as T] = issue.message
  }
  return errors
}
