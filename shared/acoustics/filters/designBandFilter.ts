import type { Band, BandsPerOctave } from '../bands/fractionalOctaveBands'
import { iec61260AcceptanceLimits, iec61260Breakpoints } from '../bands/iec61260AcceptanceLimits'
import { designButterworthBandPass } from './designButterworthBandPass'
import type { SosCascade } from './sosCascade'
import { sosMagnitudeDbAt } from './sosFrequencyResponse'

/** A designed band filter and the prototype order actually used. */
export interface BandFilter {
  band: Band
  filter: SosCascade
  /** 3 = 6-pole (default); 4 = 8-pole, used only where the 6-pole design misses class 1. */
  prototypeOrder: number
}

/** Small inset so points exactly on an edge are judged as pass band. */
const EDGE_INSET = 1 - 1e-9

function meetsClass1(filter: SosCascade, band: Band, bandsPerOctave: BandsPerOctave, sampleRateHz: number): boolean {
  const referenceDb = sosMagnitudeDbAt(filter, band.exactCentreHz, sampleRateHz)
  for (const omega of iec61260Breakpoints(bandsPerOctave)) {
    const points = [omega, omega > 1 ? omega * EDGE_INSET : omega / EDGE_INSET]
    for (const relative of points) {
      const frequencyHz = band.exactCentreHz * relative
      if (frequencyHz >= sampleRateHz / 2) continue
      const attenuationDb = referenceDb - sosMagnitudeDbAt(filter, frequencyHz, sampleRateHz)
      const limits = iec61260AcceptanceLimits(relative, { bandsPerOctave, filterClass: 1 })
      if (attenuationDb < limits.minDb || attenuationDb > limits.maxDb) return false
    }
  }
  return true
}

/**
 * The band filter for one IEC 61260-1 band: a 6-pole Butterworth band-pass (facts §3: meets class 1
 * as an analog design). Near Nyquist the bilinear transform widens the analog band and the 6-pole
 * design loses up to ~6 dB on the low-side skirt (e.g. 16 kHz third-octave at 44.1 kHz); there the
 * 8-pole design is used instead, checked against the class-1 limits at every Table 1 breakpoint.
 */
export function designBandFilter(band: Band, bandsPerOctave: BandsPerOctave, sampleRateHz: number): BandFilter {
  const edges = { lowerEdgeHz: band.lowerEdgeHz, upperEdgeHz: band.upperEdgeHz, sampleRateHz }
  const sixPole = designButterworthBandPass({ ...edges, prototypeOrder: 3 })
  if (meetsClass1(sixPole, band, bandsPerOctave, sampleRateHz)) return { band, filter: sixPole, prototypeOrder: 3 }
  return { band, filter: designButterworthBandPass({ ...edges, prototypeOrder: 4 }), prototypeOrder: 4 }
}
