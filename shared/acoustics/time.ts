/** Sample count to seconds: t = samples / fs. */
export function samplesToSeconds(sampleCount: number, sampleRateHz: number): number {
  return sampleCount / sampleRateHz
}

/** Seconds to the nearest whole sample count: n = round(t·fs). */
export function secondsToSamples(durationS: number, sampleRateHz: number): number {
  return Math.round(durationS * sampleRateHz)
}

/** Sample index to milliseconds: t = 1000·n / fs. */
export function samplesToMilliseconds(sampleCount: number, sampleRateHz: number): number {
  return (1000 * sampleCount) / sampleRateHz
}
