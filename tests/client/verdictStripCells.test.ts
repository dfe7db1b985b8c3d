import { describe, expect, it } from 'vitest'
import type { TargetMask } from '@shared/room'
import { verdictStripCells } from '@/components/verdictStripCells'

// An invented mask: limits chosen so each verdict of bandVerdict occurs once.
const MASK: TargetMask = {
  id: 'test',
  name: 'Test mask',
  kind: 'custom',
  citation: null,
  sourceNote: 'invented for the test',
  notes: [],
  bands: [
    { centreHz: 125, minS: 0.2, maxS: 0.3, nominalS: 0.25 },
    { centreHz: 250, minS: 0.2, maxS: 0.3, nominalS: 0.25 },
    { centreHz: 500, minS: 0.2, maxS: 0.3, nominalS: 0.25 },
    { centreHz: 1000, minS: 0.2, maxS: 0.3, nominalS: 0.25 },
    { centreHz: 2000, minS: null, maxS: null, nominalS: null },
  ],
}

describe('verdictStripCells', () => {
  it('returns one cell per mask band with label, value and a measured-vs-target description', () => {
    const cells = verdictStripCells(
      [
        { centreHz: 125, reverberationTimeS: 0.52, isReliable: true },
        { centreHz: 250, reverberationTimeS: 0.25, isReliable: true },
        { centreHz: 500, reverberationTimeS: 0.12, isReliable: true },
        { centreHz: 1000, reverberationTimeS: 0.25, isReliable: false },
        { centreHz: 2000, reverberationTimeS: 0.25, isReliable: true },
      ],
      MASK,
    )
    expect(cells.map((c) => c.verdict)).toEqual(['too-live', 'inside', 'too-dead', 'not-reliable', 'no-target'])
    expect(cells.map((c) => c.label)).toEqual(['Too live', 'Inside target', 'Too dead', 'Not reliable', 'No target'])
    expect(cells[0]?.valueText).toBe('0.52 s')
    expect(cells[0]?.description).toBe('125 Hz: measured 0.52 s, target 0.20–0.30 s — too live.')
    expect(cells[3]?.description).toContain('flagged by the analysis')
    expect(cells[4]?.description).toBe('2 kHz: measured 0.25 s, no target limit — no target.')
  })

  it('returns a not-analysed cell with a dash when no position was analysed in the band', () => {
    const [cell] = verdictStripCells([], { ...MASK, bands: MASK.bands.slice(0, 1) })
    expect(cell?.verdict).toBe('not-analysed')
    expect(cell?.valueText).toBe('—')
    expect(cell?.description).toBe('125 Hz: not analysed in these bands yet, target 0.20–0.30 s — not analysed.')
  })
})
