import { formatNumber } from './formatNumber'

/** A receiver position for reading: "(1.75, 1.7, 1.2) m", "height 1.2 m" when only z is known, null when none is. */
export function formatPosition(xM: number | null, yM: number | null, zM: number | null): string | null {
  if (xM === null && yM === null) return zM === null ? null : `height ${formatNumber(zM, 2)} m`
  return `(${[xM, yM, zM].map((v) => (v === null ? '–' : formatNumber(v, 2))).join(', ')}) m`
}
