import { fractionalOctaveBands, OCTAVE_RATIO as G } from './shared/acoustics/bands/fractionalOctaveBands'
import { designButterworthBandPass } from './shared/acoustics/filters/designButterworthBandPass'
import { sosMagnitudeDbAt } from './shared/acoustics/filters/sosFrequencyResponse'
const order = Number(process.argv[2] ?? 3)
const octBreaks: [number, number, number][] = [ // omegaOct, minAtt, maxAtt (class1)
 [1, -0.4, 0.4],[G**(1/8), -0.4, 0.5],[G**(1/4), -0.4, 0.7],[G**(3/8), -0.4, 1.4],[G**0.5*(1-1e-9), -0.4, 5.3],[G**0.5*(1+1e-9), 1.2, Infinity],[G,16.6,Infinity],[G**2,40.5,Infinity],[G**3,60,Infinity],[G**4,70,Infinity]]
for (const fs of [44100, 48000]) for (const b of [1,3] as const) {
  const out: string[] = []
  for (const band of fractionalOctaveBands({bandsPerOctave:b, minNominalHz: 1000, sampleRateHz: fs})) {
  let worst = Infinity, where=''
    const f = designButterworthBandPass({lowerEdgeHz: band.lowerEdgeHz, upperEdgeHz: band.upperEdgeHz, sampleRateHz: fs, prototypeOrder: order})
    const ref = sosMagnitudeDbAt(f, band.exactCentreHz, fs)
    for (const [wo, mn, mx] of octBreaks) {
      const wb = 1 + (G**(1/(2*b)) - 1)/(G**0.5 - 1)*(wo - 1)
      for (const w of [wb, 1/wb]) {
        const fr = band.exactCentreHz*w; if (fr >= fs/2) continue
        const att = ref - sosMagnitudeDbAt(f, fr, fs)
        const margin = Math.min(att - mn, mx - att)
        if (margin < worst) { worst = margin; where = `w=${w.toFixed(4)}` }
      }
    }
  out.push(`${band.nominalHz}:${worst.toFixed(2)}(${where})`)
  }
  console.log(fs, b, out.join(' '))
}
