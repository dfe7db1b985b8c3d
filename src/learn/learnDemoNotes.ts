import { LEARN_BANDS_HZ, type LearnDemoSettings } from './runLearnDemo'

/** The room notes that say what a saved demo is and how it was made. */
export function learnDemoNotes(settings: LearnDemoSettings): string {
  const bands = LEARN_BANDS_HZ.map((centreHz, i) => `${centreHz >= 1000 ? `${centreHz / 1000} kHz` : `${centreHz} Hz`}: ${(settings.T60S[i] ?? 0).toFixed(2)} s`).join(', ')
  return [
    'Teaching demo made in Ringdown’s Learn view: a synthetic room, not a measurement.',
    `Reverberation time set per octave band — ${bands}.`,
    `Noise floor ${settings.noiseFloorDb} dB re the peak; random seed ${settings.seed} (the same settings give the same response).`,
    'The impulse response is exponentially decaying noise per band, analysed per ISO 3382 (EDT, T20, T30).',
  ].join('\n')
}
