/**
 * Schroeder frequency, the limit above which modes overlap enough for a statistical (diffuse)
 * description: f_s = 2000·sqrt(T/V) ["Room Acoustics" textbook Eq. 3.44, via transcription;
 * facts §7]. Below f_s, treat the bass as a modal problem, not a reverberation-time problem.
 *
 * @param reverberationTimeS - measured or predicted T, s
 * @param volumeM3 - room volume, m³
 * @returns f_s, Hz (V = 50 m³, T = 0.3 s → 154.9 Hz)
 */
export function schroederFrequencyHz(reverberationTimeS: number, volumeM3: number): number {
  if (!(reverberationTimeS > 0) || !(volumeM3 > 0)) throw new RangeError('reverberationTimeS and volumeM3 must be positive')
  return 2000 * Math.sqrt(reverberationTimeS / volumeM3)
}
