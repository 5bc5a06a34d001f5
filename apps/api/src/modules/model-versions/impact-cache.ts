/**
 * A small in-memory cache of impact previews, keyed by the pair of engine input hashes (so
 * any change to either version, the pathway, the member count or the engine's spec defaults
 * is a new key). Oldest entries go first past `capacity` (Map keeps insertion order; a hit
 * moves the entry to the end). Concurrent requests for the same key share one computation.
 * Memory only: a restart recomputes, which is cheap next to keeping a table of previews.
 */
export class ImpactCache<T> {
  private readonly done = new Map<string, T>();
  private readonly pending = new Map<string, Promise<T>>();

  constructor(private readonly capacity = 64) {}

  get(key: string): T | undefined {
    const value = this.done.get(key);
    if (value !== undefined) {
      this.done.delete(key);
      this.done.set(key, value);
    }
    return value;
  }

  /** The cached value, or the running computation for this key, or a new one (failures are not kept). */
  getOrCompute(key: string, compute: () => Promise<T>): { value: Promise<T>; cached: boolean } {
    const hit = this.get(key);
    if (hit !== undefined) return { value: Promise.resolve(hit), cached: true };
    const running = this.pending.get(key);
    if (running) return { value: running, cached: false };
    const started = compute().then(
      (value) => {
        this.pending.delete(key);
        this.done.set(key, value);
        while (this.done.size > this.capacity) this.done.delete(this.done.keys().next().value as string);
        return value;
      },
      (error: unknown) => {
        this.pending.delete(key);
        throw error;
      },
    );
    this.pending.set(key, started);
    return { value: started, cached: false };
  }
}
