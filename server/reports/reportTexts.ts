import type { BandVerdict } from '../../shared/room/targets/bandVerdict'

const VERDICT_TEXT: Record<BandVerdict, string> = {
  inside: 'inside target',
  'too-live': 'too live',
  'too-dead': 'too dead',
  'not-reliable': 'not reliable',
  'not-analysed': 'not analysed',
  'no-target': 'no limit here',
}

export const verdictText = (verdict: BandVerdict) => VERDICT_TEXT[verdict]

/** The verdict groups of the first page, in plain words. */
export const VERDICT_GROUP_TEXT: Record<BandVerdict, string> = {
  inside: 'Inside the target',
  'too-live': 'Too live (reverberation time above the upper limit)',
  'too-dead': 'Too dead (reverberation time below the lower limit)',
  'not-reliable': 'Not reliable (the analysis flagged the value, so it is not judged)',
  'not-analysed': 'Not analysed in these bands',
  'no-target': 'No limit set by the target',
}

export const hzLabel = (value: number) => (value >= 1000 ? `${value / 1000} kHz` : `${value} Hz`)

/** How the numbers were made, for the report's method section. */
export const METHOD_NOTES = [
  'Impulse responses measured directly or deconvolved from exponential sine sweeps (ISO 18233:2006; Farina 2000).',
  'Band filters: IEC 61260-1:2014 base-10 octave or third-octave bands, 6-pole Butterworth band-pass (class 1), time-reversed filtering where set (ISO 3382-2:2008, 7.3 note).',
  'Decay: Schroeder backward integration (ISO 3382-1:2009, 5.3.3) with noise-floor truncation and compensation in the manner of Lundeby et al. (1995).',
  'Evaluation ranges: EDT 0 to −10 dB, T20 −5 to −25 dB, T30 −5 to −35 dB, least-squares fits (ISO 3382-1:2009 and ISO 3382-2:2008).',
  'The band value judged is the mean T30 over the positions used, or T20 where T30 is flagged; flagged bands are reported as not reliable, never hidden.',
  'σ is the standard uncertainty of that mean per ISO 3382-2:2008 Annex A, with N = the number of positions used; positions left out are listed with the reason.',
]

export const REPORT_CAUTIONS = [
  'Predictions and targets are estimates; small rooms are not diffuse below the Schroeder frequency.',
  'Mounting panels, bass traps or speakers on walls and ceilings needs fixings suited to the load and the wall.',
  'Check the fire ratings of foams, fibres and fabrics; follow local building and fire codes, and use licensed professionals for structural, electrical and fire-safety work.',
  'Test signals can be loud: start playback low and protect your hearing.',
]
