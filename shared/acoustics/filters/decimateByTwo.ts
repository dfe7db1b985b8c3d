/**
 * Zero-phase decimation by two: y[m] = Σ_{k=−M}^{M} h[k]·x[2m − k] (centred, so output sample m
 * is input time 2m exactly; zeros outside the signal). Uses the half-band structure: the centre tap
 * plus odd taps only.
 * @param taps half-band taps h[0 … M] from designHalfBandLowPass
 * @returns ⌈N/2⌉ samples at fs/2
 */
export function decimateByTwo(input: Float64Array, taps: Float64Array): Float64Array {
  const length = input.length
  const output = new Float64Array(Math.ceil(length / 2))
  const half = taps.length - 1
  const centre = taps[0] as number
  for (let m = 0; m < output.length; m++) {
    const i = 2 * m
    let sum = centre * (input[i] as number)
    if (i - half >= 0 && i + half < length) {
      for (let k = 1; k <= half; k += 2) sum += (taps[k] as number) * ((input[i - k] as number) + (input[i + k] as number))
    } else {
      for (let k = 1; k <= half; k += 2) {
        const before = i - k >= 0 ? (input[i - k] as number) : 0
        const after = i + k < length ? (input[i + k] as number) : 0
        sum += (taps[k] as number) * (before + after)
      }
    }
    output[m] = sum
  }
  return output
}
