/**
 * A cascade of second-order sections (biquads), each
 * H_i(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²).
 * `coefficients` holds five numbers per section in the order b0, b1, b2, a1, a2.
 */
export interface SosCascade {
  sectionCount: number
  coefficients: Float64Array
}

/** Builds a cascade from per-section [b0, b1, b2, a1, a2] rows. */
export function createSosCascade(sections: ReadonlyArray<readonly [number, number, number, number, number]>): SosCascade {
  const coefficients = new Float64Array(sections.length * 5)
  sections.forEach((row, index) => coefficients.set(row, index * 5))
  return { sectionCount: sections.length, coefficients }
}
