import { isBandWithin, type TargetMask } from './targetMask'

/**
 * Small home studio / control room: roughly flat T between 0.2 and 0.4 s over 200 Hz–4 kHz
 * (common practice, no source; close to the EBU Tm for 30–150 m³). No limits outside that range:
 * a modest rise in the bass is accepted and below the Schroeder frequency the bass is a modal,
 * not a reverberation-time, problem.
 */
export function smallStudioCommonPracticeMask(bandsHz: readonly number[]): TargetMask {
  return {
    id: 'small-studio-common-practice',
    name: 'Small studio (common practice)',
    kind: 'common-practice',
    citation: null,
    sourceNote: null,
    notes: ['A rule of thumb of the trade, not a standard: 0.2–0.4 s over 200 Hz–4 kHz.', 'No limits below 200 Hz or above 4 kHz.'],
    bands: bandsHz.map((centreHz) =>
      isBandWithin(centreHz, 200, 4000) ? { centreHz, minS: 0.2, maxS: 0.4, nominalS: 0.3 } : { centreHz, minS: null, maxS: null, nominalS: null },
    ),
  }
}
