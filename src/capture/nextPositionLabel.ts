/** "Position 3" → "Position 4"; a label without a trailing number gets " 2". */
export function nextPositionLabel(label: string): string {
  const match = /^(.*?)(\d+)\s*$/.exec(label)
  if (!match) return `${label.trim() || 'Position'} 2`
  return `${match[1]}${Number(match[2]) + 1}`
}
