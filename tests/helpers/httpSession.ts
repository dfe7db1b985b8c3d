import { request as httpRequest, type IncomingMessage } from 'node:http'

/** A signed-in session against a listening server, over real HTTP (what EventSource needs). */
export interface HttpSession {
  cookie: string
  csrfToken: string
}

function cookieOf(response: Response, previous = ''): string {
  const fresh = response.headers.getSetCookie().map((line) => line.split(';')[0]!)
  return fresh.length > 0 ? fresh.join('; ') : previous
}

export async function signInOverHttp(baseUrl: string, email: string, password: string): Promise<HttpSession> {
  const csrf = await fetch(`${baseUrl}/api/auth/csrf`)
  let cookie = cookieOf(csrf)
  const { csrfToken } = (await csrf.json()) as { csrfToken: string }
  const signIn = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { cookie, 'content-type': 'application/json', 'x-csrf-token': csrfToken },
    body: JSON.stringify({ email, password }),
  })
  if (signIn.status !== 200) throw new Error(`sign-in of ${email} failed: ${signIn.status}`)
  cookie = cookieOf(signIn, cookie)
  const fresh = await fetch(`${baseUrl}/api/auth/csrf`, { headers: { cookie } })
  return { cookie: cookieOf(fresh, cookie), csrfToken: ((await fresh.json()) as { csrfToken: string }).csrfToken }
}

export interface SseEvent {
  event: string
  data: unknown
}

export interface EventStream {
  status: number
  contentType: string
  events: SseEvent[]
  /** Resolves with the first event (already received or coming) that matches; rejects on timeout. */
  next(predicate: (event: SseEvent) => boolean, timeoutMs?: number): Promise<SseEvent>
  /** Resolves when the server ends the stream. */
  ended: Promise<void>
  close(): void
}

/** Opens a server-sent event stream and parses it (event/data fields; comments ignored). */
export function openEventStream(url: string, cookie: string): Promise<EventStream> {
  return new Promise((resolve, reject) => {
    const events: SseEvent[] = []
    const waiters: { predicate: (event: SseEvent) => boolean; resolve: (event: SseEvent) => void }[] = []
    const req = httpRequest(url, { headers: { cookie, accept: 'text/event-stream' } }, (res: IncomingMessage) => {
      let buffer = ''
      const ended = new Promise<void>((resolveEnd) => {
        res.on('end', () => resolveEnd())
        res.on('close', () => resolveEnd())
      })
      res.setEncoding('utf8')
      res.on('data', (chunk: string) => {
        buffer += chunk
        let end: number
        while ((end = buffer.indexOf('\n\n')) >= 0) {
          const block = buffer.slice(0, end)
          buffer = buffer.slice(end + 2)
          let name = 'message'
          const data: string[] = []
          for (const line of block.split('\n')) {
            if (line.startsWith('event:')) name = line.slice(6).trim()
            else if (line.startsWith('data:')) data.push(line.slice(5).replace(/^ /, ''))
          }
          if (data.length === 0) continue
          const text = data.join('\n')
          let parsed: unknown = text
          try {
            parsed = JSON.parse(text)
          } catch {
            // plain text data
          }
          const event = { event: name, data: parsed }
          events.push(event)
          for (const waiter of [...waiters]) {
            if (waiter.predicate(event)) {
              waiters.splice(waiters.indexOf(waiter), 1)
              waiter.resolve(event)
            }
          }
        }
      })
      resolve({
        status: res.statusCode ?? 0,
        contentType: String(res.headers['content-type'] ?? ''),
        events,
        next(predicate, timeoutMs = 30_000) {
          const seen = events.find(predicate)
          if (seen) return Promise.resolve(seen)
          return new Promise((resolveEvent, rejectEvent) => {
            const timer = setTimeout(() => rejectEvent(new Error(`no matching event within ${timeoutMs} ms; got ${JSON.stringify(events.map((e) => e.event))}`)), timeoutMs)
            waiters.push({ predicate, resolve: (event) => (clearTimeout(timer), resolveEvent(event)) })
          })
        },
        ended,
        close: () => req.destroy(),
      })
    })
    req.on('error', (error) => {
      if ((error as NodeJS.ErrnoException).code !== 'ECONNRESET') reject(error)
    })
    req.end()
  })
}
