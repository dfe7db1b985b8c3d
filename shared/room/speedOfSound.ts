/** 0 °C in kelvin. */
export const ZERO_CELSIUS_K = 273.15

/**
 * Speed of sound in air from the air temperature.
 *
 * c = 343.2·sqrt(T_K / 293.15) m/s, T_K = θ + 273.15 — the reference form of ISO 9613-1:1993
 * (as transcribed in the project's acoustics facts, §7). Humidity changes c by well under 1 %
 * and is left out, as in the standard's form.
 *
 * @param temperatureC - air temperature, °C (default 20 °C → 343.2 m/s)
 * @returns speed of sound, m/s
 */
export function speedOfSoundMps(temperatureC = 20): number {
  const temperatureK = temperatureC + ZERO_CELSIUS_K
  if (!(temperatureK > 0)) throw new RangeError(`temperatureC must be above −273.15 °C, got ${temperatureC}`)
  return 343.2 * Math.sqrt(temperatureK / 293.15)
}
