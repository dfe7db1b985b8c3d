import type { AnalysisResult, DecayCurve } from '../../shared/types/analysis'

const POINT_COUNT = 300

/** Level of a decimated curve at a time, by linear interpolation; null outside it. */
function levelAt(curve: DecayCurve, timeMs: number): number | null {
  const { timeMs: t, levelDb } = curve
  if (t.length === 0 || timeMs < t[0]! || timeMs > t[t.length - 1]!) return null
  let i = 1
  while (i < t.length - 1 && t[i]! < timeMs) i++
  const span = t[i]! - t[i - 1]!
  const fraction = span > 0 ? (timeMs - t[i - 1]!) / span : 0
  return levelDb[i - 1]! + fraction * (levelDb[i]! - levelDb[i - 1]!)
}

/**
 * Spatial average of the positions' Schroeder decays per band: energy mean (10^(L/10)) on a
 * common time grid that every position covers, in dB re its start. Fits are left out: the
 * survey's band values are the means of each position's own fits, not fits of this curve.
 */
export function averageDecayCurves(results: AnalysisResult[]): DecayCurve[] {
  if (results.length === 0) return []
  const bands = results[0]!.decays.map((curve) => curve.centreHz)
  return bands.flatMap((centreHz) => {
    const curves = results.map((r) => r.decays.find((c) => c.centreHz === centreHz)).filter((c): c is DecayCurve => c !== undefined && c.timeMs.length > 1)
    if (curves.length === 0) return []
    const endMs = Math.min(...curves.map((c) => c.timeMs[c.timeMs.length - 1]!))
    const timeMs = Array.from({ length: POINT_COUNT }, (_, i) => (endMs * i) / (POINT_COUNT - 1))
    const power = timeMs.map((t) => curves.reduce((sum, curve) => sum + 10 ** ((levelAt(curve, t) ?? -200) / 10), 0) / curves.length)
    const startPower = power[0]! > 0 ? power[0]! : 1
    return [{ centreHz, timeMs, levelDb: power.map((p) => 10 * Math.log10(p / startPower)), fits: { EDT: null, T20: null, T30: null }, truncationMs: null }]
  })
}
