import { describe, it } from 'vitest'
import { hilbertTransform } from '../../../../shared/acoustics/fft/hilbertTransform'
import { expectWithin } from '../../../helpers/tolerance'

describe('hilbertTransform', () => {
  it('returns sin for cos, i.e. the analytic signal of a cosine (scipy.signal.hilbert documentation)', () => {
    // A whole number of periods over a power-of-two length: the circular transform is then exact.
    const length = 4096
    const cycles = 37
    const cosine = Float64Array.from({ length }, (_, n) => Math.cos((2 * Math.PI * cycles * n) / length))
    const quadrature = hilbertTransform(cosine)
    for (let n = 0; n < length; n += 97) expectWithin(quadrature[n] as number, Math.sin((2 * Math.PI * cycles * n) / length), 1e-9)
  })
})
