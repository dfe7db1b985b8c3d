/** Least-squares straight line y = intercept + slope·x, with its coefficient of determination. */
export interface LineFit {
  slope: number
  intercept: number
  /** r² = Sxy² / (Sxx·Syy), 0..1; 1 for a perfect line (also when y is constant). */
  r2: number
  /** Number of points used. */
  count: number
}

function fitFromCentredSums(meanX: number, meanY: number, sxx: number, sxy: number, syy: number, count: number): LineFit {
  const slope = sxx > 0 ? sxy / sxx : 0
  const r2 = sxx > 0 && syy > 0 ? (sxy * sxy) / (sxx * syy) : 1
  return { slope, intercept: meanY - slope * meanX, r2, count }
}

/**
 * Ordinary least squares over paired points (two passes, centred sums for precision).
 * slope = Σ(x−x̄)(y−ȳ) / Σ(x−x̄)², intercept = ȳ − slope·x̄ (ISO 3382-2:2008 Annex C, Eqs. C.1–C.6).
 * @param x abscissae, length ≥ 2
 * @param y ordinates, same length as x
 */
export function linearFit(x: ArrayLike<number>, y: ArrayLike<number>): LineFit {
  const count = Math.min(x.length, y.length)
  let sumX = 0
  let sumY = 0
  for (let i = 0; i < count; i++) {
    sumX += x[i] as number
    sumY += y[i] as number
  }
  const meanX = sumX / count
  const meanY = sumY / count
  let sxx = 0
  let sxy = 0
  let syy = 0
  for (let i = 0; i < count; i++) {
    const dx = (x[i] as number) - meanX
    const dy = (y[i] as number) - meanY
    sxx += dx * dx
    sxy += dx * dy
    syy += dy * dy
  }
  return fitFromCentredSums(meanX, meanY, sxx, sxy, syy, count)
}

/**
 * Least squares over uniformly spaced samples y[startIndex … endIndex−1], with x = index·stepX.
 * Avoids building an x array for long decay curves (hundreds of thousands of samples).
 */
export function linearFitUniform(y: ArrayLike<number>, startIndex: number, endIndex: number, stepX: number): LineFit {
  const count = endIndex - startIndex
  // Σ(i − ī)² for consecutive integers has a closed form: n(n² − 1)/12.
  const meanIndex = (startIndex + endIndex - 1) / 2
  let sumY = 0
  for (let i = startIndex; i < endIndex; i++) sumY += y[i] as number
  const meanY = sumY / count
  let sxy = 0
  let syy = 0
  for (let i = startIndex; i < endIndex; i++) {
    const dy = (y[i] as number) - meanY
    sxy += (i - meanIndex) * dy
    syy += dy * dy
  }
  const sxx = (count * (count * count - 1)) / 12
  return fitFromCentredSums(meanIndex * stepX, meanY, sxx * stepX * stepX, sxy * stepX, syy, count)
}
