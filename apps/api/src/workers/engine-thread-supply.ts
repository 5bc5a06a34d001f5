import type { RunSpec } from "@plumeline/contracts";
import { EngineThread, type EngineOutcome, type EngineRunner } from "./engine-thread-client.js";

/**
 * A run this large or larger gets its engine thread replaced when it ends. Why: the run's
 * arrays (about 0.8 KB per member, so ~0.8 GB at 1,000,000 members) stay in the thread until
 * its collector runs, which may be long after; ending the thread hands them back to the
 * system at once, and a fresh thread (started right away; the engine's helper threads start
 * with its first large run, whose set-up this thread does while they start) is ready
 * for the next run. Below this size a run's memory is small and keeping the warm thread is
 * worth more.
 */
export const REPLACE_AFTER_MEMBERS = 200_000;

/**
 * The embedded queue's engine threads, started as jobs need them rather than one per worker
 * slot: each idle engine thread holds a JavaScript heap and the engine's own helper threads
 * (tens of MB together), so threads the queue is not using cost the server's memory for
 * nothing. One thread is kept ready, so a run does not wait for a thread to start; a second
 * job running at the same time starts a thread of its own, which stops when its job ends.
 */
export class EngineThreadSupply {
  private readonly ready: EngineThread[] = [];
  private readonly live = new Set<EngineThread>();
  private readonly keepReady: number;
  private readonly replaceAfterMembers: number;
  private started = 0;
  private stopped = false;

  constructor(
    private readonly namePrefix: string,
    options: { keepReady?: number; replaceAfterMembers?: number } = {},
  ) {
    this.keepReady = options.keepReady ?? 1;
    this.replaceAfterMembers = options.replaceAfterMembers ?? REPLACE_AFTER_MEMBERS;
  }

  /** Starts the threads kept ready (call once, at start-up). */
  prestart(): void {
    while (this.ready.length < this.keepReady) this.ready.push(this.start());
  }

  /** A runner for one worker slot: each run takes a thread and gives it back when it settles. */
  runner(): EngineRunner {
    let current: EngineThread | null = null;
    return {
      run: async (spec: RunSpec, onProgress?: (fraction: number) => void): Promise<EngineOutcome> => {
        const thread = this.take();
        current = thread;
        try {
          return await thread.run(spec, onProgress);
        } finally {
          current = null;
          this.giveBack(thread, spec.members);
        }
      },
      cancel: () => current?.cancel(),
    };
  }

  /** Ends every thread (runs in progress end with EngineThreadCrashed). */
  async stop(): Promise<void> {
    this.stopped = true;
    this.ready.length = 0;
    await Promise.all([...this.live].map((thread) => thread.terminate()));
    this.live.clear();
  }

  /** Threads alive now (ready or running). */
  get size(): number {
    return [...this.live].filter((thread) => thread.alive).length;
  }

  /** Threads started so far (ready, running or ended). */
  get threadsStarted(): number {
    return this.started;
  }

  private take(): EngineThread {
    for (;;) {
      const thread = this.ready.shift();
      if (!thread) break;
      if (thread.alive) return thread;
      this.live.delete(thread);
    }
    return this.start();
  }

  private giveBack(thread: EngineThread, members: number): void {
    const keep = thread.alive && !this.stopped && members < this.replaceAfterMembers && this.ready.length < this.keepReady;
    if (keep) {
      this.ready.push(thread);
      return;
    }
    this.live.delete(thread);
    if (thread.alive) void thread.terminate();
    if (!this.stopped) this.prestart();
  }

  private start(): EngineThread {
    const thread = new EngineThread(`${this.namePrefix}-${this.started++}`);
    this.live.add(thread);
    return thread;
  }
}
