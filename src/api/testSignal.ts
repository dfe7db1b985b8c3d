import { apiUrl, toQuery } from './http'

export interface SweepParameters {
  f1Hz: number
  f2Hz: number
  durationS: number
  sampleRateHz: number
  levelDb: number
}

/** Download link of the exponential test sweep WAV with these parameters. */
export function sweepDownloadUrl(parameters: SweepParameters): string {
  return apiUrl(
    `/test-signal/sweep.wav${toQuery({
      f1: String(parameters.f1Hz),
      f2: String(parameters.f2Hz),
      seconds: String(parameters.durationS),
      rate: String(parameters.sampleRateHz),
      levelDb: String(parameters.levelDb),
    })}`,
  )
}
