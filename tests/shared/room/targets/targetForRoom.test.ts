import { describe, expect, it } from 'vitest'
import { OCTAVE_CENTRES_HZ, TARGET_IDS, THIRD_OCTAVE_CENTRES_HZ, targetForRoom } from '../../../../shared/room/targets/targetForRoom'
import { expectWithin } from '../../../helpers/tolerance'

describe('targetForRoom', () => {
  it('returns the EBU mask for listening-type rooms', () => {
    for (const use of ['control-room', 'mixing-room', 'home-theatre'] as const) {
      const target = targetForRoom({ use, volumeM3: 80 })
      expect(target.id).toBe('ebu-tech-3276')
      // EBU Tech 3276 Tm at 80 m³ = 0.2321 s (facts check values)
      expectWithin(target.bands[0]!.nominalS!, 0.2321, 1e-4)
    }
  })

  it('returns DIN 18041 for rehearsal rooms and classrooms and common practice for other rooms', () => {
    expect(targetForRoom({ use: 'rehearsal-room', volumeM3: 120 }).id).toBe('din-18041-a1')
    const classroom = targetForRoom({ use: 'classroom', volumeM3: 200 })
    expect(classroom.id).toBe('din-18041-a3')
    // DIN 18041 A3 at 200 m³ = 0.5663 s (facts check values)
    expectWithin(classroom.bands[3]!.nominalS!, 0.5663, 1e-4)
    expect(targetForRoom({ use: 'other', volumeM3: 40 }).id).toBe('small-studio-common-practice')
  })

  it('returns the explicitly chosen target and one band per requested centre', () => {
    const target = targetForRoom({ use: 'classroom', volumeM3: 250, targetId: 'ansi-s12-60' }, THIRD_OCTAVE_CENTRES_HZ)
    expect(target.id).toBe('ansi-s12-60')
    expect(target.bands.map((b) => b.centreHz)).toEqual([...THIRD_OCTAVE_CENTRES_HZ])
    expect(targetForRoom({ use: 'other', volumeM3: 200, targetId: 'din-18041-a4' }).name).toContain('A4')
  })

  it('returns a mask with a citation (or common-practice kind) and no provenance wording for every target id', () => {
    for (const targetId of TARGET_IDS) {
      const target = targetForRoom({ use: 'other', volumeM3: 200, targetId })
      expect(target.id).toBe(targetId)
      expect(target.kind === 'common-practice' || (target.citation?.standard.length ?? 0) > 3).toBe(true)
      expect(JSON.stringify(target)).not.toMatch(/from memory|verify|facts|§/i)
      expect(target.bands).toHaveLength(OCTAVE_CENTRES_HZ.length)
    }
  })
})
