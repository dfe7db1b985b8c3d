import { describe, expect, it } from 'vitest'
import { customTargetMask } from '../../../../shared/room/targets/customTargetMask'
import { OCTAVE_CENTRES_HZ, THIRD_OCTAVE_CENTRES_HZ } from '../../../../shared/room/targets/targetForRoom'
import { parseRoomTargetChoice, roomTargetChoiceToProfile } from '../../../../shared/room/targets/roomTargetChoice'
import { targetCitationText } from '../../../../shared/room/targets/targetCitationText'

const definition = {
  id: 7,
  name: 'Client brief: vocal booth',
  sourceNote: 'Client brief of 3 March, section 2',
  octaveLimits: OCTAVE_CENTRES_HZ.map((centreHz) => ({ centreHz, minS: centreHz === 63 ? null : 0.15, maxS: centreHz >= 1000 ? 0.3 : 0.4 })),
}

describe('customTargetMask', () => {
  it('returns the octave limits at octave centres and keeps the source note', () => {
    const mask = customTargetMask(definition, OCTAVE_CENTRES_HZ)
    expect(mask.id).toBe('custom:7')
    expect(mask.kind).toBe('custom')
    expect(mask.bands.find((b) => b.centreHz === 63)).toMatchObject({ minS: null, maxS: 0.4 })
    expect(mask.bands.find((b) => b.centreHz === 2000)).toMatchObject({ minS: 0.15, maxS: 0.3 })
    expect(targetCitationText(mask)).toBe('Custom target of this workspace; source: Client brief of 3 March, section 2')
  })

  it('returns each third octave the limits of the octave it lies in (common practice)', () => {
    const mask = customTargetMask(definition, THIRD_OCTAVE_CENTRES_HZ)
    const at = (hz: number) => mask.bands.find((b) => b.centreHz === hz)!
    // 800 and 1250 Hz thirds belong to the 1 kHz octave; 630 Hz to the 500 Hz octave.
    expect(at(800).maxS).toBe(0.3)
    expect(at(1250).maxS).toBe(0.3)
    expect(at(630).maxS).toBe(0.4)
    // 50 Hz lies in the 63 Hz octave, 10 kHz in the 8 kHz octave.
    expect(at(50)).toMatchObject({ minS: null, maxS: 0.4 })
    expect(at(10000).maxS).toBe(0.3)
  })
})

describe('parseRoomTargetChoice', () => {
  it('reads auto, published ids and custom:<id>, and refuses anything else', () => {
    expect(parseRoomTargetChoice('auto')).toEqual({ kind: 'auto' })
    expect(parseRoomTargetChoice('din-18041-a3')).toEqual({ kind: 'published', targetId: 'din-18041-a3' })
    expect(parseRoomTargetChoice('custom:12')).toEqual({ kind: 'custom', customTargetId: 12 })
    expect(parseRoomTargetChoice('custom:0')).toBeNull()
    expect(parseRoomTargetChoice('bs-1116')).toBeNull()
    expect(roomTargetChoiceToProfile({ kind: 'custom', customTargetId: 12 })).toBe('custom:12')
  })
})
