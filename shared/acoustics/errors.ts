/**
 * Thrown by shared/acoustics when an input cannot be analysed (empty, non-finite, too short …).
 * `code` is stable and machine-readable; `message` is one plain sentence for the user.
 */
export class DspInputError extends Error {
  readonly code: string

  constructor(code: string, message: string) {
    super(message)
    this.name = 'DspInputError'
    this.code = code
  }
}
