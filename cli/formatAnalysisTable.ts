import type { AnalysisResult, DecayParameters } from '../shared/types/analysis'

const HEADER = ['Band Hz', 'T20 s', 'T30 s', 'EDT s', 'C50 dB', 'C80 dB', 'D50', 'Ts ms', 'Range dB', 'Flags']

function cell(value: number | null, digits: number, scale = 1): string {
  return value === null ? '—' : (value * scale).toFixed(digits)
}

function row(label: string, p: DecayParameters): string[] {
  const flags = [...new Set(p.warnings.map((warning) => warning.code))].join(',')
  return [label, cell(p.T20, 2), cell(p.T30, 2), cell(p.EDT, 2), cell(p.C50, 1), cell(p.C80, 1), cell(p.D50, 2), cell(p.Ts, 0, 1000), cell(p.decayRangeDb, 0), flags]
}

/** A plain-text band table for people at a terminal (the JSON is for scripts). */
export function formatAnalysisTable(result: AnalysisResult, file: string): string {
  const rows = [HEADER, ...result.bands.map((band) => row(String(band.centreHz), band)), row('broadband', result.broadband)]
  const widths = HEADER.map((_, column) => Math.max(...rows.map((cells) => (cells[column] ?? '').length)))
  const lines = rows.map((cells) => cells.map((text, column) => (column === cells.length - 1 ? text : text.padStart(widths[column] ?? 0))).join('  '))
  const bandsLabel = result.settings.bands === 'octave' ? 'octave' : 'third-octave'
  const intro = `${file}: ${result.kind}, ${result.sampleRate} Hz, ${result.durationS.toFixed(2)} s, onset at ${result.onsetMs.toFixed(2)} ms, ${bandsLabel} bands`
  const notes = result.warnings.map((warning) => `note: ${warning.message}`)
  return [intro, '', ...lines, ...(notes.length ? ['', ...notes] : []), ''].join('\n')
}
