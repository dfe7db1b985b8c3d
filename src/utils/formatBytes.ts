const UNITS = ['B', 'kB', 'MB', 'GB'] as const

/** A size for reading, in decimal units (1 MB = 10⁶ bytes, as file managers show them). */
export function formatBytes(byteCount: number): string {
  let value = byteCount
  let unit = 0
  while (value >= 1000 && unit < UNITS.length - 1) {
    value /= 1000
    unit += 1
  }
  const decimals = unit === 0 || value >= 100 ? 0 : 1
  return `${value.toFixed(decimals)} ${UNITS[unit]}`
}
