import type { AnalysisWarning } from '@shared/types/analysis'

export type BandWarningCode = AnalysisWarning['code']

export interface BandWarningText {
  /** A few words for the chip. */
  label: string
  /** What it means and what to do, in plain language, for the tooltip. */
  explanation: string
}

// Thresholds as the engine applies them: decay ranges from ISO 3382-1:2009 5.3.3, B·T from
// ISO 3382-2:2008 7.3, curvature from ISO 3382-2 Annex B.3; the r² limit is common practice.
const TEXTS: Record<BandWarningCode, BandWarningText> = {
  'decay-range-edt': {
    label: 'EDT range',
    explanation: 'Less than 25 dB of clean decay in this band: EDT needs 25 dB (ISO 3382-1). Measure louder or in a quieter room.',
  },
  'decay-range-t20': {
    label: 'T20 range',
    explanation: 'Less than 35 dB of clean decay in this band: T20 needs 35 dB (ISO 3382-1). Measure louder, longer, or in a quieter room.',
  },
  'decay-range-t30': {
    label: 'T30 range',
    explanation: 'Less than 45 dB of clean decay in this band: T30 needs 45 dB (ISO 3382-1). Use T20 or measure louder / longer.',
  },
  'bandwidth-time-product': {
    label: 'Filter ringing',
    explanation:
      'The decay is so short for this band’s width that the band filter’s own ringing shapes it (B·T too small, ISO 3382-2). Read the value as an upper limit.',
  },
  curvature: {
    label: 'Curved decay',
    explanation: 'T20 and T30 disagree by more than 10 % (ISO 3382-2 Annex B): the decay is not a straight line, e.g. two coupled spaces or a strong mode.',
  },
  'poor-fit': {
    label: 'Poor fit',
    explanation: 'The fitted straight line follows the decay poorly (r² below 0.95, common practice). Check the decay curve before trusting the value.',
  },
  'no-decay': {
    label: 'No decay',
    explanation: 'No decay could be found in this band, so nothing was fitted. Check the recording and the band’s level.',
  },
  clipping: {
    label: 'Clipping',
    explanation: 'The recording reached full scale and was cut off. Record again with the input gain or playback level lower.',
  },
  'dc-offset': {
    label: 'DC offset',
    explanation: 'The recording has a constant offset from zero, usually from the interface or microphone. It was noted; check the input chain.',
  },
  'low-snr': {
    label: 'Noisy',
    explanation: 'The decay hardly rises above the background noise (less than 20 dB). Measure louder, longer, or when the room is quieter.',
  },
}

/** Chip label and plain-language explanation of a validity flag. */
export function bandWarningText(code: BandWarningCode): BandWarningText {
  return TEXTS[code]
}
