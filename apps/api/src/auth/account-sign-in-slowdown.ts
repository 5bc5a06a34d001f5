/**
 * Per-address slow-down of password guessing, on top of the per-IP limit (which many IPs get
 * around). After FAILURES_BEFORE_SLOWDOWN failed sign-ins for one address within the window,
 * that address is refused for a pause that doubles with each further failure (30 s up to
 * 15 min). Counted by the address as typed (lower-cased), whether or not an account has it,
 * so the answers never tell whether an account exists. A success clears the count.
 * Kept in this process's memory: a restart or another server process starts afresh.
 */
export const FAILURES_BEFORE_SLOWDOWN = 5;
const WINDOW_MS = 15 * 60_000;
const FIRST_PAUSE_MS = 30_000;
const LONGEST_PAUSE_MS = 15 * 60_000;
const MAX_TRACKED = 10_000;

interface Failures {
  count: number;
  firstAt: number;
  blockedUntil: number;
}

export interface SignInSlowdown {
  /** Seconds the address must still wait, or 0. */
  waitSeconds(email: string, now?: number): number;
  /** Counts a failure; returns true when this failure starts (or lengthens) a pause. */
  recordFailure(email: string, now?: number): boolean;
  recordSuccess(email: string): void;
}

export function createSignInSlowdown(): SignInSlowdown {
  const byEmail = new Map<string, Failures>();
  const key = (email: string) => email.trim().toLowerCase().slice(0, 254);
  return {
    waitSeconds(email, now = Date.now()) {
      const entry = byEmail.get(key(email));
      return entry && entry.blockedUntil > now ? Math.ceil((entry.blockedUntil - now) / 1000) : 0;
    },
    recordFailure(email, now = Date.now()) {
      const k = key(email);
      let entry = byEmail.get(k);
      if (!entry || now - entry.firstAt > WINDOW_MS) {
        entry = { count: 0, firstAt: now, blockedUntil: 0 };
        // Bounded memory: the oldest address is forgotten first (Map keeps insertion order).
        if (byEmail.size >= MAX_TRACKED) byEmail.delete(byEmail.keys().next().value!);
        byEmail.set(k, entry);
      }
      entry.count += 1;
      if (entry.count < FAILURES_BEFORE_SLOWDOWN) return false;
      const pause = Math.min(LONGEST_PAUSE_MS, FIRST_PAUSE_MS * 2 ** (entry.count - FAILURES_BEFORE_SLOWDOWN));
      entry.blockedUntil = now + pause;
      return true;
    },
    recordSuccess(email) {
      byEmail.delete(key(email));
    },
  };
}
