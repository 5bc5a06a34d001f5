/** How many runs one comparison holds: a reference and up to three others. */
export const MAX_COMPARED_RUNS = 4;

export interface CompareSlot {
  runId: string;
  /** Empty: the run's first pathway. */
  pathwayId: string;
}

/**
 * The comparison in the address: ?runs=a,b,c (run ids, the first is the reference) and an
 * optional ?pathways=x,,z aligned with them. Older links with ?a=…&b=… still open. An empty
 * id stands for a slot not chosen yet; more than four runs are cut to four.
 */
export function readCompareSelection(params: URLSearchParams): CompareSlot[] {
  const runs = params.has("runs") ? params.get("runs")!.split(",") : [params.get("a") ?? "", params.get("b") ?? ""];
  const pathways = params.has("runs") ? (params.get("pathways") ?? "").split(",") : [params.get("pa") ?? "", params.get("pb") ?? ""];
  const slots = runs.slice(0, MAX_COMPARED_RUNS).map((runId, i) => ({ runId: runId.trim(), pathwayId: (pathways[i] ?? "").trim() }));
  while (slots.length < 2) slots.push({ runId: "", pathwayId: "" });
  return slots;
}

/**
 * The query string for a selection: ?runs=… always, ?pathways=… only when one is chosen. The
 * commas stay readable (each id is encoded on its own), so the address reads ?runs=a,b,c.
 */
export function writeCompareSelection(slots: CompareSlot[]): string {
  const list = (xs: string[]) => xs.map(encodeURIComponent).join(",");
  const runs = `runs=${list(slots.map((s) => s.runId))}`;
  return slots.some((s) => s.pathwayId) ? `${runs}&pathways=${list(slots.map((s) => s.pathwayId))}` : runs;
}
