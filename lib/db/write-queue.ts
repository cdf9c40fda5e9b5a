/**
 * A first-come, first-served lock for one process: at most one holder at a
 * time, waiters served in arrival order, a waiter that waits longer than its
 * limit gives up with an error instead of hanging. Waiting costs no thread
 * (a waiter is a pending promise), which is the point: SQLite's own busy wait
 * sleeps on one of libuv's threadpool threads.
 */
export class WriteQueue {
  private held = false;
  private readonly waiters: Array<{ grant: () => void }> = [];
  /** Longest time a holder waited, for benchmarks and diagnostics. */
  maxWaitMs = 0;

  get waiting(): number {
    return this.waiters.length;
  }

  /**
   * Resolves with a release function once the caller holds the queue; rejects
   * with `onTimeout()`'s error when it has waited `limitMs` without getting it.
   * The release function may be called more than once (only the first counts).
   */
  acquire(limitMs: number, onTimeout: (waitedMs: number) => Error): Promise<() => void> {
    const asked = performance.now();
    const releaser = () => {
      this.maxWaitMs = Math.max(this.maxWaitMs, performance.now() - asked);
      let released = false;
      return () => {
        if (released) return;
        released = true;
        this.handOn();
      };
    };
    if (!this.held) {
      this.held = true;
      return Promise.resolve(releaser());
    }
    return new Promise((resolve, reject) => {
      const waiter = {
        grant: () => {
          clearTimeout(timer);
          resolve(releaser());
        },
      };
      const timer = setTimeout(() => {
        const i = this.waiters.indexOf(waiter);
        if (i >= 0) this.waiters.splice(i, 1);
        reject(onTimeout(performance.now() - asked));
      }, limitMs);
      this.waiters.push(waiter);
    });
  }

  private handOn(): void {
    const next = this.waiters.shift();
    if (next) next.grant();
    else this.held = false;
  }
}
