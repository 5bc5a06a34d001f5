import { formatPath, type ModelVersionChange } from "@plumeline/contracts";

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

const isObject = (v: unknown): v is Record<string, Json> => typeof v === "object" && v !== null && !Array.isArray(v);
const isDistribution = (v: unknown): v is Record<string, Json> & { type: string } =>
  isObject(v) && typeof v.type === "string";
const isPrimitiveArray = (v: unknown): v is Json[] => Array.isArray(v) && v.every((x) => !isObject(x) && !Array.isArray(x));

/**
 * Structured difference of two model versions' governed content (name, model, defaults, notes,
 * pinned pathways): a list of { path, before, after } in a stable order, "before" being `against`.
 *
 * Paths read like the engine's error paths ("model.climate.ecs.p50"). A distribution whose
 * type changed is reported once as a whole (comparing a lognormal's fields with a range's is
 * noise); lists of plain values (percentiles, horizons) are compared as a whole list; lists
 * of objects (correlations) element by element. A value missing on one side is null there.
 * Cost: linear in the size of the two documents.
 */
export function diffModelVersions(against: unknown, current: unknown): ModelVersionChange[] {
  const changes: ModelVersionChange[] = [];
  walk(against as Json | undefined, current as Json | undefined, [], changes);
  return changes;
}

function walk(before: Json | undefined, after: Json | undefined, path: PropertyKey[], out: ModelVersionChange[]): void {
  if (before === undefined && after === undefined) return;
  if (isDistribution(before) && isDistribution(after) && before.type !== after.type) {
    out.push({ path: formatPath(path), before, after });
    return;
  }
  if (isObject(before) && isObject(after)) {
    const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
    for (const key of keys) walk(before[key], after[key], [...path, key], out);
    return;
  }
  if (Array.isArray(before) && Array.isArray(after) && !(isPrimitiveArray(before) && isPrimitiveArray(after))) {
    const n = Math.max(before.length, after.length);
    for (let i = 0; i < n; i++) walk(before[i], after[i], [...path, i], out);
    return;
  }
  if (JSON.stringify(before) !== JSON.stringify(after))
    out.push({ path: formatPath(path), before: before ?? null, after: after ?? null });
}
