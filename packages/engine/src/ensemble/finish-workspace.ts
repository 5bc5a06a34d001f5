import { sortScratch, type SortScratch } from "../statistics/sort-order.js";
import { PercentileSelector } from "../summary/percentile-selector.js";

/**
 * The working arrays a run's pathway finish (finish-pathway.ts, sensitivity-budget.ts) uses,
 * made once per run and reused by every pathway. Why: each is O(members), and arrays made
 * afresh per threshold, horizon, input and pathway pile up as garbage (at 1,000,000 members
 * and 15 inputs, several hundred MB per run) that a worker thread's collector may not free
 * before the run ends, so they added to the process's peak memory. Each array is written in
 * full before it is read, so reuse changes no number.
 */
export interface FinishWorkspace {
  selector: PercentileSelector;
  /** One member column for a threshold's crossing years or a horizon's agent forcing, in turn. */
  column: Float64Array;
  /** Each uncertain input's member order by value (by index in plan.inputs); kept across pathways, since the inputs are. */
  inputOrders: Map<number, Uint32Array>;
  /** sortOrder's working arrays (its keys are `column`: the two are never in use at once). */
  sort: SortScratch;
  /** The member order of one horizon's warming at a time (only its ranks are kept). */
  warmingOrder: Uint32Array;
  /** One input's weighted mid-ranks at a time. */
  inputRanks: Float64Array;
  /** Per horizon, the pathway's warming's weighted mid-ranks. */
  warmingRanks: Float64Array[];
}

export function createFinishWorkspace(members: number, horizons: number): FinishWorkspace {
  const column = new Float64Array(members);
  return {
    selector: new PercentileSelector(),
    column,
    inputOrders: new Map(),
    sort: sortScratch(members, column),
    warmingOrder: new Uint32Array(members),
    inputRanks: new Float64Array(members),
    warmingRanks: Array.from({ length: horizons }, () => new Float64Array(members)),
  };
}
