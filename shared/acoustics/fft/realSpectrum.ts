/**
 * The non-negative-frequency half of the DFT of a real signal of `size` samples:
 * X[k] = re[k] + j·im[k], k = 0 … size/2 (bin k is at k·fs/size Hz). The rest follows from
 * X[size − k] = conj(X[k]).
 */
export interface RealSpectrum {
  size: number
  re: Float64Array
  im: Float64Array
}

/** A zeroed spectrum for a real transform of `size` samples (size/2 + 1 bins). */
export function createRealSpectrum(size: number): RealSpectrum {
  return { size, re: new Float64Array(size / 2 + 1), im: new Float64Array(size / 2 + 1) }
}
