import { afterEach, describe, expect, it } from "vitest";
import { z } from "zod";
import { canonicalJson, clearStoredDraft, draftStorageKey, readStoredDraft, writeStoredDraft } from "./draft-storage";

const schema = z.object({ name: z.string(), count: z.number() });
const key = draftStorageKey("thing", "u-1", "rec-9");

afterEach(() => localStorage.clear());

describe("draft storage", () => {
  it("keys a draft by format version, form, person and record, and 'new' for a record not yet saved", () => {
    expect(key).toBe("plumeline.draft.v1:thing:u-1:rec-9");
    expect(draftStorageKey("thing", "u-1", null)).toBe("plumeline.draft.v1:thing:u-1:new");
  });

  it("gives back what was written, with when it was written", () => {
    writeStoredDraft(key, { name: "Harbour", count: 3 }, new Date("2026-12-05T14:03:00Z"));
    expect(readStoredDraft(key, schema)).toEqual({
      status: "restored",
      value: { name: "Harbour", count: 3 },
      savedAt: "2026-12-05T14:03:00.000Z",
    });
    clearStoredDraft(key);
    expect(readStoredDraft(key, schema)).toEqual({ status: "none" });
  });

  it("drops a draft that no longer fits the schema, says which field, and removes it", () => {
    writeStoredDraft(key, { name: "Harbour", count: "three" }, new Date("2026-12-05T14:03:00Z"));
    const found = readStoredDraft(key, schema);
    expect(found.status).toBe("dropped");
    expect(found.status === "dropped" && found.reason).toMatch(/^it no longer fits this form \(count /);
    expect(found.status === "dropped" && found.savedAt).toBe("2026-12-05T14:03:00.000Z");
    expect(localStorage.getItem(key)).toBeNull();
  });

  it("drops text that is not JSON at all", () => {
    localStorage.setItem(key, "{half");
    expect(readStoredDraft(key, schema)).toEqual({ status: "dropped", savedAt: null, reason: "it is not readable" });
    expect(localStorage.getItem(key)).toBeNull();
  });

  it("compares states by value whatever order their keys were written in", () => {
    expect(canonicalJson({ b: 1, a: { d: [2, { y: 1, x: 0 }], c: null } })).toBe(
      canonicalJson({ a: { c: null, d: [2, { x: 0, y: 1 }] }, b: 1 }),
    );
    expect(canonicalJson({ a: [1, 2] })).not.toBe(canonicalJson({ a: [2, 1] }));
  });
});
