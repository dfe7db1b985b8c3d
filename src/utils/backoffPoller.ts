export interface BackoffPollerOptions {
  /** Fetches once; resolves true while something is still pending (keep polling). */
  poll: () => Promise<boolean>
  /** Delay before the first poll after start, ms. */
  initialDelayMs?: number
  /** The delay grows by `factor` after each poll up to this, ms. */
  maxDelayMs?: number
  factor?: number
  /** While this says true no poll is made; call `resume()` when the page is shown again. */
  isHidden?: () => boolean
}

export interface BackoffPoller {
  /** Starts polling, or restarts from the initial delay when something new is pending. */
  start: () => void
  stop: () => void
  /** After the page was hidden: polls at once if polling was paused. */
  resume: () => void
  isActive: () => boolean
  /** The delay before the next poll, ms (for display and tests). */
  currentDelayMs: () => number
}

/** The next delay of a backoff: previous × factor, capped. */
export function nextBackoffDelayMs(previousMs: number, factor: number, maxDelayMs: number): number {
  return Math.min(previousMs * factor, maxDelayMs)
}

/**
 * Polls with exponential backoff (1 s, 2 s, 4 s, 8 s, 10 s … by default) until `poll` reports
 * nothing pending. A failed poll counts as pending, so a short server outage is ridden out.
 * While the page is hidden the poller pauses instead of polling in the background.
 */
export function createBackoffPoller(options: BackoffPollerOptions): BackoffPoller {
  const initialDelayMs = options.initialDelayMs ?? 1000
  const maxDelayMs = options.maxDelayMs ?? 10_000
  const factor = options.factor ?? 2
  let delayMs = initialDelayMs
  let timer: ReturnType<typeof setTimeout> | null = null
  let isActive = false
  let isPaused = false
  let isPolling = false

  function schedule(waitMs: number): void {
    if (timer !== null) clearTimeout(timer)
    timer = setTimeout(() => void tick(), waitMs)
  }

  async function tick(): Promise<void> {
    timer = null
    if (!isActive) return
    if (options.isHidden?.()) {
      isPaused = true
      return
    }
    isPolling = true
    const isPending = await options.poll().catch(() => true)
    isPolling = false
    if (!isActive) return
    // start() during the poll has already scheduled the next one from the initial delay.
    if (timer !== null) return
    if (!isPending) {
      isActive = false
      return
    }
    delayMs = nextBackoffDelayMs(delayMs, factor, maxDelayMs)
    schedule(delayMs)
  }

  return {
    start() {
      isActive = true
      isPaused = false
      delayMs = initialDelayMs
      schedule(delayMs)
    },
    stop() {
      isActive = false
      isPaused = false
      if (timer !== null) clearTimeout(timer)
      timer = null
    },
    resume() {
      if (!isActive || !isPaused || isPolling) return
      isPaused = false
      void tick()
    },
    isActive: () => isActive,
    currentDelayMs: () => delayMs,
  }
}
