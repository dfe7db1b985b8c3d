import { describe, expect, it } from 'vitest'
import { speedOfSoundMps } from '../../../shared/room/speedOfSound'
import { expectWithin } from '../../helpers/tolerance'

describe('speedOfSoundMps', () => {
  it('returns 343.2 m/s at 20 °C', () => {
    // ISO 9613-1:1993 reference form c = 343.2·sqrt(T/293.15) (facts §7)
    expectWithin(speedOfSoundMps(20), 343.2, 1e-9)
  })

  it('follows the square-root law at 0 °C', () => {
    // ISO 9613-1 form: 343.2·sqrt(273.15/293.15) = 331.28 m/s (computed; cf. 331.3 m/s textbook value)
    expectWithin(speedOfSoundMps(0), 343.2 * Math.sqrt(273.15 / 293.15), 1e-9)
    expectWithin(speedOfSoundMps(0), 331.3, 0.05)
  })

  it('stays within 0.25 m/s of the linear approximation 331.3 + 0.606·θ over 0–20 °C', () => {
    // linear approximation c ≈ 331.3 + 0.606·θ (common practice, facts §7); it is the tangent at
    // 0 °C, so it runs 0.22 m/s above the square-root form by 20 °C (computed)
    for (const temperatureC of [0, 10, 20]) expectWithin(speedOfSoundMps(temperatureC), 331.3 + 0.606 * temperatureC, 0.25)
  })

  it('throws when the temperature is below absolute zero', () => {
    expect(() => speedOfSoundMps(-300)).toThrow(RangeError)
  })
})
