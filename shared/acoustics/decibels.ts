/** Power below this is treated as zero when converting to decibels (−300 dB floor). */
const POWER_FLOOR = 1e-30

/**
 * Power (or energy) ratio to decibels: L = 10·lg(power / referencePower).
 * Non-positive power maps to −300 dB so curves stay finite.
 */
export function powerToDecibels(power: number, referencePower = 1): number {
  return 10 * Math.log10(Math.max(power, POWER_FLOOR) / referencePower)
}

/** Inverse of {@link powerToDecibels}: power = referencePower·10^(L/10). */
export function decibelsToPower(levelDb: number, referencePower = 1): number {
  return referencePower * Math.pow(10, levelDb / 10)
}

/** Amplitude ratio to decibels: L = 20·lg(amplitude / referenceAmplitude). */
export function amplitudeToDecibels(amplitude: number, referenceAmplitude = 1): number {
  return 20 * Math.log10(Math.max(Math.abs(amplitude), 1e-15) / referenceAmplitude)
}

/** Inverse of {@link amplitudeToDecibels}. */
export function decibelsToAmplitude(levelDb: number, referenceAmplitude = 1): number {
  return referenceAmplitude * Math.pow(10, levelDb / 20)
}
