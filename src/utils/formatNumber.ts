/** Formats a number for reading: at most `maxDecimals` decimals, trailing zeros dropped. */
export function formatNumber(value: number, maxDecimals = 2): string {
  return new Intl.NumberFormat('en-GB', { maximumFractionDigits: maxDecimals }).format(value)
}

/**
 * Reads a number typed by a person: trims, accepts a decimal comma ("3,5"), rejects anything
 * else that is not a plain finite number. Returns null for an empty field, NaN for junk.
 */
export function parseNumberInput(text: string): number | null {
  const trimmed = text.trim().replace(/\s/g, '')
  if (trimmed === '') return null
  const normalised = /^[-+]?\d*,\d+$/.test(trimmed) ? trimmed.replace(',', '.') : trimmed
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(normalised)) return Number.NaN
  return Number(normalised)
}
