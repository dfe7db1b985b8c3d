type Cell = string | number | null | undefined

function escapeCell(cell: Cell): string {
  if (cell === null || cell === undefined) return ''
  const text = typeof cell === 'number' ? (Number.isFinite(cell) ? String(Number(cell.toPrecision(6))) : '') : cell
  // RFC 4180 quoting; a leading = + - @ is prefixed so spreadsheets never run it as a formula.
  const safe = /^[=+\-@]/.test(text) && typeof cell === 'string' ? `'${text}` : text
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe
}

/** Rows to CSV text (RFC 4180, CRLF line ends). */
export function toCsv(rows: Cell[][]): string {
  return rows.map((row) => row.map(escapeCell).join(',')).join('\r\n') + '\r\n'
}
