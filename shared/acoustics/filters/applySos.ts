import type { SosCascade } from './sosCascade'
import { filterThreeSections, filterFourSections } from './fusedCascade'

/** States below this are flushed to zero so decays into exact silence never reach denormals. */
const DENORMAL_GUARD = 1e-150
const GUARD_BLOCK = 1024

/**
 * Filters `buffer` in place through every section, transposed direct form II:
 * y = b0·x + s1; s1 = b1·x − a1·y + s2; s2 = b2·x − a2·y. Zero initial state.
 * `isReversed` runs the recursion from the last sample to the first.
 */
export function applySosInPlace(filter: SosCascade, buffer: Float64Array, isReversed = false): void {
  const c = filter.coefficients
  const length = buffer.length
  for (let s = 0; s < filter.sectionCount; s++) {
    const o = s * 5
    const b0 = c[o] as number
    const b1 = c[o + 1] as number
    const b2 = c[o + 2] as number
    const a1 = c[o + 3] as number
    const a2 = c[o + 4] as number
    let s1 = 0
    let s2 = 0
    for (let start = 0; start < length; start += GUARD_BLOCK) {
      const end = Math.min(length, start + GUARD_BLOCK)
      for (let k = start; k < end; k++) {
        const i = isReversed ? length - 1 - k : k
        const x = buffer[i] as number
        const y = b0 * x + s1
        s1 = b1 * x - a1 * y + s2
        s2 = b2 * x - a2 * y
        buffer[i] = y
      }
      if (Math.abs(s1) < DENORMAL_GUARD && Math.abs(s2) < DENORMAL_GUARD) {
        s1 = 0
        s2 = 0
      }
    }
  }
}

export interface ApplySosOptions {
  /**
   * Run the filter over the time-reversed signal (last sample first), which equals reversing,
   * filtering and reversing back: the filter's ringing lands before the onset instead of after it
   * (ISO 3382-2:2008 7.3 NOTE: relaxes B·T > 16 to B·T > 4). |H| is unchanged (single pass).
   */
  timeReversed?: boolean
  /** Reusable work buffer at least as long as the input; a new one is allocated if absent. */
  output?: Float64Array
}

/**
 * Filters a signal through a biquad cascade, forward or time-reversed. 3- and 4-section cascades
 * run fused (all sections per sample, states in registers); others section by section.
 * The input is not modified.
 * @returns the filtered signal (a view of `output` of the input's length, when given)
 */
export function applySos(filter: SosCascade, input: Float64Array, options: ApplySosOptions = {}): Float64Array {
  const output = options.output ? options.output.subarray(0, input.length) : new Float64Array(input.length)
  const isReversed = options.timeReversed ?? false
  if (filter.sectionCount === 3) filterThreeSections(filter.coefficients, input, output, isReversed)
  else if (filter.sectionCount === 4) filterFourSections(filter.coefficients, input, output, isReversed)
  else {
    output.set(input)
    applySosInPlace(filter, output, isReversed)
  }
  return output
}
