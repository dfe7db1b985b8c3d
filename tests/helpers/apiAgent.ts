import request from 'supertest'
import type { Express } from 'express'

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete'

/**
 * A supertest agent that keeps its session cookie and sends the CSRF token the server issued,
 * as the browser client does.
 */
export class ApiAgent {
  readonly agent: ReturnType<typeof request.agent>
  private csrfToken: string | null = null

  constructor(app: Express) {
    this.agent = request.agent(app)
  }

  async refreshCsrf(): Promise<string> {
    const response = await this.agent.get('/api/auth/csrf').expect(200)
    this.csrfToken = (response.body as { csrfToken: string }).csrfToken
    return this.csrfToken
  }

  async send(method: Method, url: string, body?: unknown) {
    if (method !== 'get' && !this.csrfToken) await this.refreshCsrf()
    const req = this.agent[method](url)
    if (method !== 'get') req.set('x-csrf-token', this.csrfToken!)
    return body === undefined ? req : req.send(body as object)
  }

  get(url: string) {
    return this.send('get', url)
  }
  post(url: string, body?: unknown) {
    return this.send('post', url, body ?? {})
  }
  patch(url: string, body?: unknown) {
    return this.send('patch', url, body ?? {})
  }
  put(url: string, body?: unknown) {
    return this.send('put', url, body ?? {})
  }
  delete(url: string) {
    return this.send('delete', url)
  }

  /** Signs in and takes the new CSRF token (the session id is regenerated at sign-in). */
  async signIn(email: string, password: string) {
    const response = await this.post('/api/auth/sign-in', { email, password })
    if (response.status === 200) await this.refreshCsrf()
    return response
  }
}

export async function signedInAgent(app: Express, email: string, password: string): Promise<ApiAgent> {
  const agent = new ApiAgent(app)
  const response = await agent.signIn(email, password)
  if (response.status !== 200) throw new Error(`sign-in of ${email} failed: ${response.status} ${JSON.stringify(response.body)}`)
  return agent
}
