/** A stand-in for the browser's EventSource that a test drives by hand. */
export class FakeEventSource extends EventTarget {
  static instances: FakeEventSource[] = []
  readyState = 0
  readonly url: string

  constructor(url: string) {
    super()
    this.url = url
    FakeEventSource.instances.push(this)
  }

  /** The server's `ready`: the stream is live. */
  ready(): void {
    this.readyState = 1
    this.dispatchEvent(new MessageEvent('ready', { data: '{"isListening":true}' }))
  }

  emit(name: string, data: unknown): void {
    this.dispatchEvent(new MessageEvent(name, { data: JSON.stringify(data) }))
  }

  /** A dropped connection; `isClosed` as after an HTTP error (the browser gives up). */
  fail(isClosed = false): void {
    this.readyState = isClosed ? 2 : 0
    this.dispatchEvent(new Event('error'))
  }

  close(): void {
    this.readyState = 2
  }

  static reset(): void {
    FakeEventSource.instances = []
  }

  static create = (url: string) => new FakeEventSource(url) as unknown as EventSource
}
