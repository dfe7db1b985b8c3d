import { interpolateInLogFrequency, type TargetMask } from './targetMask'

/**
 * Mean reverberation time of a reference listening / control room: Tm = 0.25·(V/V0)^(1/3) s,
 * V0 = 100 m³ [EBU Tech 3276 and ITU-R BS.1116, as quoted in open-source code citing "Audio
 * Metering" ch. 32; facts §9]. Tm is the mean over the 200 Hz–4 kHz third octaves (from memory —
 * verify). V = 80 m³ → 0.2321 s.
 */
export function ebuMeanReverberationTimeS(volumeM3: number): number {
  if (!(volumeM3 > 0)) throw new RangeError('volumeM3 must be positive')
  return 0.25 * Math.cbrt(volumeM3 / 100)
}

// Offsets from Tm, s, read as piecewise linear in lg f (facts §9, from memory — verify against
// BS.1116-3 Fig. 3 / EBU Tech 3276 Fig. 2).
const UPPER_OFFSET_S: [number, number][] = [[63, 0.3], [200, 0.05], [8000, 0.05]]
const LOWER_OFFSET_S: [number, number][] = [[63, -0.05], [4000, -0.05], [8000, -0.1]]

/**
 * EBU Tech 3276 / ITU-R BS.1116 tolerance mask for control, mixing and listening rooms:
 * Tm ± 0.05 s over 200 Hz–4 kHz; the upper limit rises to Tm + 0.3 s at 63 Hz, the lower falls
 * to Tm − 0.1 s at 8 kHz (linear in lg f; held constant outside 63 Hz–8 kHz).
 */
export function ebuTech3276Mask(volumeM3: number, bandsHz: readonly number[]): TargetMask {
  const meanS = ebuMeanReverberationTimeS(volumeM3)
  return {
    id: 'ebu-tech-3276',
    name: 'Reference listening room (EBU Tech 3276 / ITU-R BS.1116)',
    kind: 'published',
    // Figure numbers and the averaging band are from memory — verify (facts §9); clients see the
    // citation and the one general caution only.
    citation: {
      standard: 'EBU Tech 3276 and ITU-R BS.1116',
      edition: 'ITU-R BS.1116-3',
      clause: 'reference listening room: mean reverberation time Tm = 0.25·(V/100 m³)^(1/3) s and its tolerance limits (BS.1116-3 Fig. 3; EBU Tech 3276 Fig. 2)',
    },
    sourceNote: null,
    notes: [`Tm = ${meanS.toFixed(2)} s for this room, the mean over the 200 Hz–4 kHz third octaves.`],
    bands: bandsHz.map((centreHz) => ({
      centreHz,
      minS: Math.max(0, meanS + interpolateInLogFrequency(LOWER_OFFSET_S, centreHz)),
      maxS: meanS + interpolateInLogFrequency(UPPER_OFFSET_S, centreHz),
      nominalS: meanS,
    })),
  }
}
