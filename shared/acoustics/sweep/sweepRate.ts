/**
 * Rate constant of an exponential sweep, L = T / ln(f2/f1), s: the time the instantaneous
 * frequency f(t) = f1·e^(t/L) takes to grow by a factor e (Farina, AES 108th Conv. 2000, preprint
 * 5093; ISO 18233:2006 Annex B). 20 Hz–20 kHz in 10 s → L = 1.44765 s.
 */
export function sweepRateS(f1Hz: number, f2Hz: number, durationS: number): number {
  return durationS / Math.log(f2Hz / f1Hz)
}

/** Instantaneous frequency of the exponential sweep at time t after its start: f1·e^(t/L), Hz. */
export function sweepInstantaneousFrequencyHz(f1Hz: number, sweepRateSeconds: number, timeS: number): number {
  return f1Hz * Math.exp(timeS / sweepRateSeconds)
}

/**
 * How long before the linear impulse response the k-th harmonic's response appears after
 * deconvolution: Δt_k = L·ln k, s (Farina 2000; Novák et al., JAES 63(10), 2015).
 * 20 Hz–20 kHz, 10 s: k = 2 → 1.0034 s, k = 3 → 1.5904 s.
 */
export function harmonicDelayS(sweepRateSeconds: number, order: number): number {
  return sweepRateSeconds * Math.log(order)
}
