import { DspInputError } from '../errors'

export type WavDecodeErrorCode =
  | 'not-wav'
  | 'truncated'
  | 'unsupported-encoding'
  | 'no-samples'
  | 'all-zero'
  | 'non-finite'
  | 'unsupported-rate'
  | 'bad-channel'
  | 'too-short'

/** A WAV file that cannot be used, with a stable `code` and a message that says what to do. */
export class WavDecodeError extends DspInputError {
  declare readonly code: WavDecodeErrorCode

  constructor(code: WavDecodeErrorCode, message: string) {
    super(code, message)
    this.name = 'WavDecodeError'
  }
}
