import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createBackoffPoller, nextBackoffDelayMs } from '@/utils/backoffPoller'

/** Runs the timers up to `ms` from now and lets the poll's promise settle. */
async function advance(ms: number): Promise<void> {
  await vi.advanceTimersByTimeAsync(ms)
}

describe('nextBackoffDelayMs', () => {
  it('returns the previous delay times the factor, capped at the maximum', () => {
    expect(nextBackoffDelayMs(1000, 2, 10_000)).toBe(2000)
    expect(nextBackoffDelayMs(8000, 2, 10_000)).toBe(10_000)
    expect(nextBackoffDelayMs(10_000, 2, 10_000)).toBe(10_000)
  })
})

describe('createBackoffPoller', () => {
  beforeEach(() => vi.useFakeTimers())
  afterEach(() => vi.useRealTimers())

  it('polls after 1, 2, 4, 8 and then every 10 s while something is pending', async () => {
    const pollTimesMs: number[] = []
    const start = Date.now()
    const poller = createBackoffPoller({ poll: async () => (pollTimesMs.push(Date.now() - start), true) })

    poller.start()
    await advance(1000 + 2000 + 4000 + 8000 + 10_000 + 10_000)

    expect(pollTimesMs).toEqual([1000, 3000, 7000, 15_000, 25_000, 35_000])
    poller.stop()
  })

  it('stops polling when the poll reports nothing pending', async () => {
    const answers = [true, true, false]
    const poll = vi.fn(async () => answers.shift() ?? false)
    const poller = createBackoffPoller({ poll })

    poller.start()
    await advance(60_000)

    expect(poll).toHaveBeenCalledTimes(3)
    expect(poller.isActive()).toBe(false)
  })

  it('keeps polling with backoff when a poll fails', async () => {
    const poll = vi.fn(async () => {
      throw new Error('server down')
    })
    const poller = createBackoffPoller({ poll })

    poller.start()
    await advance(1000 + 2000 + 4000)

    expect(poll).toHaveBeenCalledTimes(3)
    expect(poller.isActive()).toBe(true)
    expect(poller.currentDelayMs()).toBe(8000)
    poller.stop()
  })

  it('makes no poll while the page is hidden and polls at once on resume', async () => {
    let isHidden = true
    const poll = vi.fn(async () => true)
    const poller = createBackoffPoller({ poll, isHidden: () => isHidden })

    poller.start()
    await advance(120_000)
    expect(poll).not.toHaveBeenCalled()

    isHidden = false
    poller.resume()
    await advance(0)
    expect(poll).toHaveBeenCalledTimes(1)
    poller.stop()
  })

  it('returns to the 1 s delay when started again, e.g. after a new upload', async () => {
    const poll = vi.fn(async () => true)
    const poller = createBackoffPoller({ poll })
    poller.start()
    await advance(1000 + 2000 + 4000)
    expect(poller.currentDelayMs()).toBe(8000)

    poller.start()
    await advance(1000)

    expect(poll).toHaveBeenCalledTimes(4)
    expect(poller.currentDelayMs()).toBe(2000)
    poller.stop()
  })

  it('makes no further poll after stop', async () => {
    const poll = vi.fn(async () => true)
    const poller = createBackoffPoller({ poll })

    poller.start()
    poller.stop()
    await advance(30_000)

    expect(poll).not.toHaveBeenCalled()
  })
})
