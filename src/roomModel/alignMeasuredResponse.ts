/** Band over which a measured response is levelled to the prediction, Hz (the scan's score band). */
export const ALIGN_BAND_HZ: [number, number] = [30, 200]

function meanOver(frequencyHz: readonly number[], levelDb: readonly number[], [lowHz, highHz]: [number, number]): number | null {
  let sum = 0
  let count = 0
  frequencyHz.forEach((f, i) => {
    const level = levelDb[i]
    if (f >= lowHz && f <= highHz && level !== undefined && Number.isFinite(level)) {
      sum += level
      count += 1
    }
  })
  return count === 0 ? null : sum / count
}

/**
 * A measured magnitude response cut to [minHz, maxHz] and shifted so its mean level over 30–200 Hz
 * equals the prediction's: the measurement's absolute level depends on the gain chain, so only
 * the shapes compare. Null when either curve has no value in the band.
 */
export function alignMeasuredResponse(
  measured: { frequencyHz: readonly number[]; magnitudeDb: readonly number[] },
  predicted: { frequencyHz: readonly number[]; levelDb: readonly number[] },
  [minHz, maxHz]: [number, number] = [20, 300],
): { frequencyHz: number[]; magnitudeDb: number[]; offsetDb: number } | null {
  const measuredMean = meanOver(measured.frequencyHz, measured.magnitudeDb, ALIGN_BAND_HZ)
  const predictedMean = meanOver(predicted.frequencyHz, predicted.levelDb, ALIGN_BAND_HZ)
  if (measuredMean === null || predictedMean === null) return null
  const offsetDb = predictedMean - measuredMean
  const frequencyHz: number[] = []
  const magnitudeDb: number[] = []
  measured.frequencyHz.forEach((f, i) => {
    if (f < minHz || f > maxHz) return
    frequencyHz.push(f)
    magnitudeDb.push((measured.magnitudeDb[i] ?? Number.NaN) + offsetDb)
  })
  return { frequencyHz, magnitudeDb, offsetDb }
}
