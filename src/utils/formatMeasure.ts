/** Shown for a value that could not be computed. */
export const NOT_COMPUTABLE = '—'

/**
 * A measured value for reading: fixed decimals (so columns line up), an optional unit after a
 * thin space, a true minus sign, and "—" for null or non-finite values.
 */
export function formatMeasure(value: number | null | undefined, decimals: number, unit = ''): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NOT_COMPUTABLE
  const rounded = Number(value.toFixed(decimals))
  // −0.0 after rounding reads as a sign error; show 0.
  const text = (Object.is(rounded, -0) ? 0 : rounded).toFixed(decimals).replace('-', '−')
  return unit ? `${text} ${unit}` : text
}

/** D50 is stored as a fraction 0..1 and read as a percentage. */
export function fractionToPercent(value: number | null): number | null {
  return value === null ? null : value * 100
}

/** Ts is stored in seconds and read in milliseconds. */
export function secondsToMilliseconds(value: number | null): number | null {
  return value === null ? null : value * 1000
}
