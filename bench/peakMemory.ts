import { resourceUsage } from 'node:process'
import { analyseCapture, DEFAULT_ANALYSIS_SETTINGS } from '../shared/acoustics/analyseCapture'
import { benchImpulse } from './benchImpulse'

// One analysis in a fresh process, so max RSS is that case's peak (Node: maxRSS in kilobytes).
const [rateArg = '48000', secondsArg = '10', bands = 'third'] = process.argv.slice(2)
const sampleRateHz = Number(rateArg)
const impulse = benchImpulse(sampleRateHz, Number(secondsArg))
analyseCapture(impulse, { sampleRateHz, kind: 'impulse', settings: { ...DEFAULT_ANALYSIS_SETTINGS, bands: bands as 'octave' | 'third' } })
console.log((resourceUsage().maxRSS / 1024).toFixed(0))
