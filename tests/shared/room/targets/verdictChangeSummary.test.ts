import { describe, expect, it } from 'vitest'
import type { MeasuredBand } from '../../../../shared/room/targets/bandVerdict'
import { ebuTech3276Mask } from '../../../../shared/room/targets/ebuTech3276'
import { OCTAVE_CENTRES_HZ } from '../../../../shared/room/targets/targetForRoom'
import { countVerdicts, midBandReverberationS, summarizeVerdictChange } from '../../../../shared/room/targets/verdictChangeSummary'
import { expectWithin } from '../../../helpers/tolerance'

const bands = (values: number[], reliable = values.map(() => true)): MeasuredBand[] =>
  OCTAVE_CENTRES_HZ.map((centreHz, i) => ({ centreHz, reverberationTimeS: values[i]!, isReliable: reliable[i]! }))

describe('midBandReverberationS', () => {
  it('returns the mean of the 500 Hz and 1 kHz octaves, skipping unreliable values', () => {
    // single-number mid-band T = mean of 500 + 1000 Hz octaves (ISO 3382-1 — from memory — verify)
    expectWithin(midBandReverberationS(bands([1, 1, 1, 0.6, 0.64, 1, 1, 1]))!, 0.62, 1e-12)
    expect(midBandReverberationS(bands([1, 1, 1, 0.6, 0.64, 1, 1, 1], [true, true, true, false, false, true, true, true]))).toBeNull()
  })
})

describe('summarizeVerdictChange', () => {
  it('returns the before → after line with counts and mid-band T', () => {
    // EBU mask for V = 100 m³ (Tm = 0.25 s, 0.2–0.3 s from 250 Hz to 4 kHz; facts §9): before has
    // 2k/4k/8k inside; after has 63–500 Hz, 2k and 4k inside, 1 kHz too live, 8 kHz too dead
    const mask = ebuTech3276Mask(100, OCTAVE_CENTRES_HZ)
    const before = bands([0.9, 0.8, 0.7, 0.6, 0.64, 0.29, 0.28, 0.26])
    const after = bands([0.45, 0.4, 0.27, 0.29, 0.33, 0.26, 0.24, 0.1])
    const line = summarizeVerdictChange({ afterLabel: 'After panels', before, after, mask, bandKind: 'octave' })
    expect(line).toBe('After panels: 6 of 8 judged octave bands inside the target (was 3 of 8); mid-band T fell from 0.62 s to 0.31 s.')
  })

  it('returns a line that judges nothing and names the unreliable bands when every band is flagged', () => {
    const mask = ebuTech3276Mask(100, OCTAVE_CENTRES_HZ)
    const flagged = bands([0.3, 0.3, 0.3, 0.3, 0.3, 0.3, 0.3, 0.3], Array(8).fill(false))
    expect(summarizeVerdictChange({ afterLabel: 'Bass traps', before: flagged, after: flagged, mask, bandKind: 'octave' })).toBe(
      'Bass traps: no octave band could be judged; 8 bands not reliable; mid-band T not available.',
    )
  })

  it('says "not analysed" and counts no band when nothing was analysed in these bands', () => {
    const mask = ebuTech3276Mask(100, [100, 125, 160])
    const before = [100, 125, 160].map((centreHz) => ({ centreHz, reverberationTimeS: 0.5, isReliable: true }))
    const line = summarizeVerdictChange({ afterLabel: 'After', before, after: [], mask, bandKind: 'third-octave' })
    expect(line).toBe('After: not analysed in third-octave bands yet, so no band was judged.')
    expect(line).not.toContain('reliable')
  })

  it('counts only judged bands when some bands are not analysed', () => {
    const mask = ebuTech3276Mask(100, OCTAVE_CENTRES_HZ)
    const after = bands([0.45, 0.4, 0.27, 0.29, 0.33, 0.26, 0.24, 0.1]).map((b, i) => (i < 2 ? { ...b, reverberationTimeS: null, isReliable: false, isAnalysed: false } : b))
    const counts = countVerdicts(after, mask)
    expect(counts).toMatchObject({ judged: 6, notAnalysed: 2, notReliable: 0 })
    expect(summarizeVerdictChange({ afterLabel: 'After', before: after, after, mask, bandKind: 'octave' })).toContain('4 of 6 judged octave bands inside the target (was 4 of 6); 2 bands not analysed yet')
  })
})
