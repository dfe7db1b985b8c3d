/** An error with an HTTP status that the error handler turns into `{ error: { code, message, fields } }`. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message)
    this.name = new.target.name
  }
}

export class ValidationError extends HttpError {
  constructor(message: string, fields?: Record<string, string>) {
    super(400, 'validation', message, fields)
  }
}

export class UnauthenticatedError extends HttpError {
  constructor(message = 'Sign in to continue.') {
    super(401, 'unauthenticated', message)
  }
}

export class ForbiddenError extends HttpError {
  constructor(message = 'Your role does not allow this.', code = 'forbidden') {
    super(403, code, message)
  }
}

/** Also used for records of another workspace, so their existence is not revealed. */
export class NotFoundError extends HttpError {
  constructor(what = 'That record', code = 'not-found') {
    super(404, code, `${what} was not found.`)
  }
}

export class ConflictError extends HttpError {
  constructor(code: string, message: string) {
    super(409, code, message)
  }
}
