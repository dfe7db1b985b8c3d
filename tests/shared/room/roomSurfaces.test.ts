import { describe, expect, it } from 'vitest'
import { roomSurfaceAreaM2 } from '../../../shared/room/roomGeometry'
import { roomSurfaces } from '../../../shared/room/roomSurfaces'
import { expectWithin } from '../../helpers/tolerance'

const ROOM = { lengthM: 5, widthM: 4, heightM: 2.5 }
const MATERIALS = { floor: 'wood-floor-on-joists', ceiling: 'gypsum-board-on-studs', walls: 'plaster-on-brick' }

describe('roomSurfaces', () => {
  it('returns six boundaries that sum to 2(LW + WH + HL)', () => {
    // 5 × 4 × 2.5 m: S = 85 m² (closed form; facts §8 example)
    const surfaces = roomSurfaces(ROOM, MATERIALS)
    expect(surfaces).toHaveLength(6)
    expectWithin(surfaces.reduce((sum, s) => sum + s.areaM2, 0), 85, 1e-9)
    expect(roomSurfaceAreaM2(ROOM)).toBe(85)
    expect(surfaces.find((s) => s.name === 'left side wall')!.areaM2).toBe(12.5)
  })

  it('returns the host wall less its openings, each opening with its own material', () => {
    const surfaces = roomSurfaces(ROOM, { ...MATERIALS, rearWall: 'gypsum-board-on-studs' }, [
      { name: 'door', boundary: 'rear wall', areaM2: 1.8, materialId: 'wood-floor-on-joists' },
      { name: 'window', boundary: 'right side wall', areaM2: 2, materialId: 'glass-window' },
    ])
    expectWithin(surfaces.find((s) => s.name === 'rear wall')!.areaM2, 10 - 1.8, 1e-12)
    expect(surfaces.find((s) => s.name === 'rear wall')!.materialId).toBe('gypsum-board-on-studs')
    expect(surfaces.find((s) => s.name === 'window')!.materialId).toBe('glass-window')
    expectWithin(surfaces.reduce((sum, s) => sum + s.areaM2, 0), 85, 1e-9)
  })

  it('throws when an opening is larger than its wall', () => {
    expect(() => roomSurfaces(ROOM, MATERIALS, [{ name: 'gate', boundary: 'front wall', areaM2: 11, materialId: 'glass-window' }])).toThrow(RangeError)
  })
})
