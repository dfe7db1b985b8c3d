import type { AnalysisDto } from '../../shared/api/captures'

export interface FileResult {
  file: string
  captureId: number | null
  status: 'done' | 'failed' | 'timed-out'
  /** The 1 kHz octave band of the analysis (ISO 3382-2 parameters); null when not analysed. */
  band1kHz: { T20S: number | null; T30S: number | null; EDTS: number | null } | null
  /** Why the file failed, in one line; null when it was analysed. */
  message: string | null
}

export function band1kHzOf(analysis: AnalysisDto): FileResult['band1kHz'] {
  const band = analysis.result.bands.find((candidate) => candidate.centreHz === 1000)
  return band ? { T20S: band.T20, T30S: band.T30, EDTS: band.EDT } : null
}

const seconds = (value: number | null | undefined) => (value === null || value === undefined ? '—' : value.toFixed(3))

/** A plain-text table: one row per file, reverberation times at 1 kHz in seconds. */
export function formatUploadTable(results: FileResult[]): string {
  const header = ['File', 'Capture', 'Status', 'T30 1 kHz s', 'T20 1 kHz s', 'EDT 1 kHz s']
  const rows = results.map((r) => [r.file, r.captureId === null ? '—' : String(r.captureId), r.status, seconds(r.band1kHz?.T30S), seconds(r.band1kHz?.T20S), seconds(r.band1kHz?.EDTS)])
  const widths = header.map((title, column) => Math.max(title.length, ...rows.map((row) => row[column]!.length)))
  const line = (cells: string[]) => cells.map((cell, column) => (column < 3 ? cell.padEnd(widths[column]!) : cell.padStart(widths[column]!))).join('  ').trimEnd()
  return [line(header), ...rows.map(line)].join('\n')
}

/** One line per failed file, for standard error. */
export function failureLines(results: FileResult[]): string[] {
  return results.filter((r) => r.status !== 'done').map((r) => `${r.file}: ${r.message ?? r.status}`)
}
