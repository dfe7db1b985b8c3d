/** A refusal or failure from the server (or the network), worded for one line of output. */
export class RequestFailedError extends Error {
  constructor(
    message: string,
    readonly status: number | null,
    readonly code: string | null,
  ) {
    super(message)
  }
}

export interface RingdownClient {
  baseUrl: string
  token: string
  getJson: <T>(path: string) => Promise<T>
}

/** Turns a non-2xx answer into one readable line: the server's own message when it sent one. */
export async function failureOf(response: Response): Promise<RequestFailedError> {
  const text = await response.text().catch(() => '')
  try {
    const body = JSON.parse(text) as { error?: { code?: string; message?: string } }
    if (body.error?.message) return new RequestFailedError(body.error.message, response.status, body.error.code ?? null)
  } catch {
    // Not our JSON (a proxy's error page, say): fall back to the status line.
  }
  return new RequestFailedError(`the server answered ${response.status} ${response.statusText}`.trim(), response.status, null)
}

export function networkFailure(baseUrl: string, error: unknown): RequestFailedError {
  const cause = (error as { cause?: { code?: string; message?: string } }).cause
  return new RequestFailedError(`cannot reach ${baseUrl} (${cause?.code ?? cause?.message ?? (error as Error).message})`, null, null)
}

/** JSON requests to the Ringdown API with the token as `Authorization: Bearer …`. */
export function createRingdownClient(baseUrl: string, token: string): RingdownClient {
  return {
    baseUrl,
    token,
    async getJson<T>(path: string): Promise<T> {
      let response: Response
      try {
        response = await fetch(`${baseUrl}${path}`, { headers: { authorization: `Bearer ${token}`, accept: 'application/json' } })
      } catch (error) {
        throw networkFailure(baseUrl, error)
      }
      if (!response.ok) throw await failureOf(response)
      return (await response.json()) as T
    },
  }
}
