/**
 * Curvature of the decay, C = 100·(T30/T20 − 1) %; above 10 % the decay is strongly curved
 * (e.g. double slope), and a single reverberation time describes it poorly.
 * @see ISO 3382-2:2008 Annex B.3 (via transcription)
 */
export function decayCurvaturePercent(t20S: number, t30S: number): number {
  return 100 * (t30S / t20S - 1)
}

/** Curvature above which ISO 3382-2 B.3 calls the decay strongly curved, %. */
export const CURVATURE_LIMIT_PERCENT = 10
