import { ZERO_CELSIUS_K } from './speedOfSound'

/** Atmospheric conditions for air absorption. */
export interface AirConditions {
  /** Air temperature, °C (default 20). */
  temperatureC?: number
  /** Relative humidity, % (default 50). */
  relativeHumidityPercent?: number
  /** Ambient pressure, kPa (default 101.325). */
  pressureKpa?: number
}

const REFERENCE_PRESSURE_KPA = 101.325
const REFERENCE_TEMPERATURE_K = 293.15
const TRIPLE_POINT_K = 273.16
/** 10·lg(e): converts a level decay in dB to a natural-log (energy) decay. */
const DB_PER_NEPER_ENERGY = 10 / Math.LN10

/**
 * Pure-tone atmospheric absorption coefficient α in dB/m, ISO 9613-1:1993 Eqs. (3)–(5) and
 * Annex B (saturation vapour pressure):
 *
 * α = 8.686·f²·[1.84e−11·(pa/pr)⁻¹·(T/T0)^½ + (T/T0)^(−5/2)·(0.01275·e^(−2239.1/T)/(frO + f²/frO)
 *     + 0.1068·e^(−3352/T)/(frN + f²/frN))]
 * frO = (pa/pr)·(24 + 4.04e4·h·(0.02 + h)/(0.391 + h)),
 * frN = (pa/pr)·(T/T0)^(−½)·(9 + 280·h·e^(−4.170·((T/T0)^(−⅓) − 1))),
 * h = hr·(psat/pr)/(pa/pr), psat/pr = 10^(−6.8346·(273.16/T)^1.261 + 4.6151).
 *
 * Checked against the facts table (20 °C, 50 %: 4 kHz → 29.7 dB/km).
 *
 * @param frequencyHz - pure-tone frequency, Hz (use the band centre for a band estimate)
 * @returns α, dB per metre
 */
export function airAttenuationDbPerM(frequencyHz: number, conditions: AirConditions = {}): number {
  const { temperatureC = 20, relativeHumidityPercent = 50, pressureKpa = REFERENCE_PRESSURE_KPA } = conditions
  const temperatureK = temperatureC + ZERO_CELSIUS_K
  const pressureRatio = pressureKpa / REFERENCE_PRESSURE_KPA
  const tempRatio = temperatureK / REFERENCE_TEMPERATURE_K
  const saturationRatio = 10 ** (-6.8346 * (TRIPLE_POINT_K / temperatureK) ** 1.261 + 4.6151)
  const molarWater = (relativeHumidityPercent * saturationRatio) / pressureRatio
  const frO = pressureRatio * (24 + (4.04e4 * molarWater * (0.02 + molarWater)) / (0.391 + molarWater))
  const frN =
    pressureRatio * tempRatio ** -0.5 * (9 + 280 * molarWater * Math.exp(-4.17 * (tempRatio ** (-1 / 3) - 1)))
  const f2 = frequencyHz * frequencyHz
  const classical = 1.84e-11 / pressureRatio * Math.sqrt(tempRatio)
  const oxygen = (0.01275 * Math.exp(-2239.1 / temperatureK)) / (frO + f2 / frO)
  const nitrogen = (0.1068 * Math.exp(-3352.0 / temperatureK)) / (frN + f2 / frN)
  return 8.686 * f2 * (classical + tempRatio ** -2.5 * (oxygen + nitrogen))
}

/**
 * Energy attenuation coefficient m (1/m) used in the Sabine/Eyring air term 4mV:
 * m = α / (10·lg e) = α / 4.343, α from {@link airAttenuationDbPerM} (facts §8).
 *
 * @returns m, 1/m (20 °C, 50 %, 4 kHz → 6.83e−3)
 */
export function airEnergyAbsorptionPerM(frequencyHz: number, conditions: AirConditions = {}): number {
  return airAttenuationDbPerM(frequencyHz, conditions) / DB_PER_NEPER_ENERGY
}
