import type { ZodType } from "zod";

/**
 * Unsaved form drafts kept in the browser's localStorage, so a reload or a closed tab does not
 * lose typed work. One entry per person, form and record; the key carries a format version so a
 * future change of a form's shape starts afresh instead of feeding an old draft to a new form
 * (and every restored draft is checked against its schema anyway).
 */
export const DRAFT_FORMAT_VERSION = 1;

const PREFIX = `plumeline.draft.v${DRAFT_FORMAT_VERSION}`;

/** `plumeline.draft.v1:<form>:<user>:<record or "new">`. */
export function draftStorageKey(form: string, userId: string, recordId: string | null | undefined): string {
  return `${PREFIX}:${form}:${userId}:${recordId ?? "new"}`;
}

interface StoredEnvelope {
  savedAt: string;
  value: unknown;
}

export type StoredDraft<T> =
  | { status: "none" }
  | { status: "restored"; value: T; savedAt: string }
  /** Something was stored but it no longer fits the form: it has been removed. */
  | { status: "dropped"; savedAt: string | null; reason: string };

function storage(): Storage | null {
  // Private modes and locked-down browsers may refuse storage: drafts are then simply not kept.
  try {
    return typeof window === "undefined" ? null : window.localStorage;
  } catch {
    return null;
  }
}

/** Reads a draft and checks it with `schema`; an unreadable or invalid entry is removed and reported. */
export function readStoredDraft<T>(key: string, schema: ZodType<T>): StoredDraft<T> {
  const store = storage();
  const raw = store?.getItem(key) ?? null;
  if (raw === null) return { status: "none" };
  let envelope: Partial<StoredEnvelope>;
  try {
    envelope = JSON.parse(raw) as Partial<StoredEnvelope>;
  } catch {
    store?.removeItem(key);
    return { status: "dropped", savedAt: null, reason: "it is not readable" };
  }
  const savedAt = typeof envelope.savedAt === "string" ? envelope.savedAt : null;
  const parsed = schema.safeParse(envelope.value);
  if (!parsed.success || savedAt === null) {
    store?.removeItem(key);
    const issue = parsed.success ? null : parsed.error.issues[0];
    const where = issue ? `${issue.path.map(String).join(".") || "the draft"} ${issue.message}` : "it has no date";
    return { status: "dropped", savedAt, reason: `it no longer fits this form (${where})` };
  }
  return { status: "restored", value: parsed.data, savedAt };
}

export function writeStoredDraft(key: string, value: unknown, now: Date = new Date()): void {
  try {
    storage()?.setItem(key, JSON.stringify({ savedAt: now.toISOString(), value } satisfies StoredEnvelope));
  } catch {
    // Storage full or refused: the form still works, only the reload safety net is missing.
  }
}

export function clearStoredDraft(key: string): void {
  storage()?.removeItem(key);
}

/**
 * JSON with object keys sorted, so two states that hold the same values compare equal whatever
 * order their keys were written in (a spread moves a changed key to the end).
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v !== null && typeof v === "object" && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : v,
  );
}
