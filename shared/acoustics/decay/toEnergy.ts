/**
 * Squared samples p²[n] (energy per sample), written to `output` if given (may be the input itself).
 * @returns the energy array, same length as the input
 */
export function toEnergy(samples: Float64Array, output: Float64Array = new Float64Array(samples.length)): Float64Array {
  for (let i = 0; i < samples.length; i++) {
    const value = samples[i] as number
    output[i] = value * value
  }
  return output
}
