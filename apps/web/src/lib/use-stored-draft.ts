import { useCallback, useEffect, useState } from "react";
import type { ZodType } from "zod";
import { canonicalJson, clearStoredDraft, readStoredDraft, writeStoredDraft, type StoredDraft } from "./draft-storage";

/**
 * What was kept in this browser under `key` when the form opened: a draft to restore, or one that
 * had to be dropped. Read once, during the first render, so the form can start from it. `key`
 * null means "do not keep" (nobody known yet, or a read-only form).
 */
export function useStoredDraft<T>(key: string | null, schema: ZodType<T>) {
  const [found, setFound] = useState<StoredDraft<T>>(() => (key ? readStoredDraft(key, schema) : { status: "none" }));

  /** After a save or a discard: the kept draft goes, and so does the notice about it. */
  const clear = useCallback(() => {
    if (key) clearStoredDraft(key);
    setFound({ status: "none" });
  }, [key]);
  const dismiss = useCallback(() => setFound({ status: "none" }), []);

  return { found, clear, dismiss };
}

/** Keeps `current` under `key` while it differs from what was loaded (`dirty`); removes it once it does not. */
export function useKeepDraft(key: string | null, current: unknown, dirty: boolean): void {
  const snapshot = canonicalJson(current);
  useEffect(() => {
    if (!key) return;
    if (dirty) writeStoredDraft(key, JSON.parse(snapshot) as unknown);
    else clearStoredDraft(key);
  }, [key, dirty, snapshot]);
}
