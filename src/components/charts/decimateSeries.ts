/** Largest number of points a chart line is given; the server already decimates to a few thousand. */
export const MAX_CHART_POINTS = 4000

/**
 * Guard against an undecimated curve reaching a chart: keeps the first and last point and, per
 * bucket of consecutive points, the minimum and the maximum (in x order), so peaks and dips
 * survive. Returns [x, y] pairs; curves of at most maxPoints are passed through unchanged.
 */
export function decimateSeries(x: readonly number[], y: readonly number[], maxPoints = MAX_CHART_POINTS): [number, number][] {
  const count = Math.min(x.length, y.length)
  const pairs: [number, number][] = []
  if (count <= maxPoints) {
    for (let i = 0; i < count; i++) pairs.push([x[i] as number, y[i] as number])
    return pairs
  }
  const bucketCount = Math.max(1, Math.floor((maxPoints - 2) / 2))
  const bucketSize = (count - 2) / bucketCount
  pairs.push([x[0] as number, y[0] as number])
  for (let b = 0; b < bucketCount; b++) {
    const start = 1 + Math.floor(b * bucketSize)
    const end = Math.min(count - 1, 1 + Math.floor((b + 1) * bucketSize))
    let minIndex = start
    let maxIndex = start
    for (let i = start; i < end; i++) {
      if ((y[i] as number) < (y[minIndex] as number)) minIndex = i
      if ((y[i] as number) > (y[maxIndex] as number)) maxIndex = i
    }
    const [first, second] = minIndex <= maxIndex ? [minIndex, maxIndex] : [maxIndex, minIndex]
    pairs.push([x[first] as number, y[first] as number])
    if (second !== first) pairs.push([x[second] as number, y[second] as number])
  }
  pairs.push([x[count - 1] as number, y[count - 1] as number])
  return pairs
}
