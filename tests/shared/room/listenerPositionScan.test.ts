import { describe, expect, it } from 'vitest'
import { listenerPositionScan, standardDeviation } from '../../../shared/room/listenerPositionScan'
import { modalResponse } from '../../../shared/room/modalResponse'
import { expectWithin } from '../../helpers/tolerance'

const ROOM = { lengthM: 5, widthM: 4, heightM: 2.5 }
const C = 343

describe('standardDeviation', () => {
  it('returns the population standard deviation', () => {
    // closed form: values 2, 4, 4, 4, 5, 5, 7, 9 have mean 5 and σ = 2
    expect(standardDeviation([2, 4, 4, 4, 5, 5, 7, 9])).toBe(2)
  })
})

describe('listenerPositionScan', () => {
  it('returns scores symmetric about L/2 when the source sits at the centre of the length', () => {
    // modal-sum mirror symmetry x → L − x (closed form), so positions mirrored about L/2 score alike
    const scan = listenerPositionScan({
      room: ROOM,
      source: { xM: 2.5, yM: 0.8, zM: 0.4 },
      listener: { xM: 0, yM: 2.3, zM: 1.2 },
      speedOfSoundMps: C,
      reverberationTimeS: 0.4,
      xStartM: 1,
      xEndM: 4,
      positionCount: 7,
    })
    for (let i = 0; i < 3; i++) expectWithin(scan.positions[i]!.smoothnessDb, scan.positions[6 - i]!.smoothnessDb, 1e-9)
  })

  it('returns the smoothest position as bestIndex and each response equal to the modal model', () => {
    const options = { room: ROOM, source: [{ xM: 0.6, yM: 1.2, zM: 1.2 }, { xM: 0.6, yM: 2.8, zM: 1.2 }], listener: { xM: 2, yM: 2, zM: 1.2 }, speedOfSoundMps: C, reverberationTimeS: 0.4 }
    const scan = listenerPositionScan(options)
    expect(scan.positions).toHaveLength(29)
    const best = scan.positions[scan.bestIndex]!
    expect(scan.positions.every((p) => p.smoothnessDb >= best.smoothnessDb)).toBe(true)
    // the scan only moves the receiver: its curve equals modalResponse at that spot
    const direct = modalResponse({ ...options, receiver: best.listener })
    expect(best.levelDb).toEqual(direct.levelDb)
    expectWithin(scan.positions[0]!.listener.xM, 0.75, 1e-12)
    expect(best.listener.yM).toBe(2)
  })

  it('throws when no frequency lies in the score band', () => {
    const options = { room: ROOM, source: { xM: 0.5, yM: 1, zM: 1 }, listener: { xM: 2, yM: 2, zM: 1.2 }, speedOfSoundMps: C, reverberationTimeS: 0.4, frequenciesHz: [250, 260] }
    expect(() => listenerPositionScan(options)).toThrow(RangeError)
  })
})
