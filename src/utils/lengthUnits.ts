/** The length units a user can enter dimensions in. Values are always stored and sent in metres. */
export type LengthUnit = 'm' | 'ft'

export const LENGTH_UNITS: readonly LengthUnit[] = ['m', 'ft']

/** The international foot: exactly 0.3048 m (international yard and pound agreement, 1959). */
export const METRES_PER_FOOT = 0.3048

/** One cubic foot in cubic metres: 0.3048³ = 0.028316846592 m³ exactly. */
export const CUBIC_METRES_PER_CUBIC_FOOT = METRES_PER_FOOT ** 3

export function feetToMetres(lengthFt: number): number {
  return lengthFt * METRES_PER_FOOT
}

export function metresToFeet(lengthM: number): number {
  return lengthM / METRES_PER_FOOT
}

export function cubicFeetToCubicMetres(volumeFt3: number): number {
  return volumeFt3 * CUBIC_METRES_PER_CUBIC_FOOT
}

export function cubicMetresToCubicFeet(volumeM3: number): number {
  return volumeM3 / CUBIC_METRES_PER_CUBIC_FOOT
}

/** A length in metres expressed in the given unit. */
export function lengthFromMetres(lengthM: number, unit: LengthUnit): number {
  return unit === 'ft' ? metresToFeet(lengthM) : lengthM
}

/** A length in the given unit expressed in metres. */
export function lengthToMetres(length: number, unit: LengthUnit): number {
  return unit === 'ft' ? feetToMetres(length) : length
}

/** A volume in cubic metres expressed in the cube of the given unit. */
export function volumeFromCubicMetres(volumeM3: number, unit: LengthUnit): number {
  return unit === 'ft' ? cubicMetresToCubicFeet(volumeM3) : volumeM3
}

/** A volume in the cube of the given unit expressed in cubic metres. */
export function volumeToCubicMetres(volume: number, unit: LengthUnit): number {
  return unit === 'ft' ? cubicFeetToCubicMetres(volume) : volume
}

export function volumeUnitLabel(unit: LengthUnit): string {
  return unit === 'ft' ? 'ft³' : 'm³'
}
