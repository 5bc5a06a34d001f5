import { validateDistribution } from "../distributions/index.js";
import { validatePerilInputs } from "../peril/validate-peril-inputs.js";
import {
  MAX_HORIZONS,
  MAX_MEMBERS,
  MAX_PATHWAY_YEARS,
  MAX_PATHWAYS_PER_RUN,
  MAX_PERCENTILES,
  MAX_THRESHOLDS,
  MAX_YEAR,
  MIN_YEAR,
} from "./limits.js";
import { SpecError } from "./spec-error.js";
import {
  CLIMATE_INPUTS,
  CONCENTRATION_KEYS,
  FORCING_AGENTS,
  FORCING_EXPRESSIONS,
  type ForcingAgent,
  type RunSpec,
} from "./types.js";

/**
 * Checks a defaults-applied spec for everything the engine relies on and throws the first
 * problem as a SpecError naming the field. The shared contracts schema runs first in the
 * CLI and API; this is the engine's own guard for library callers, and it adds the checks
 * only the engine can make (distribution parameters via the distribution module).
 * Outcomes of sampling (a non-positive heat capacity, a matrix that is not positive
 * definite) are checked where the samples are drawn.
 */
export function validateSpec(spec: RunSpec): void {
  if (typeof spec.seed !== "string" || spec.seed.length === 0) throw new SpecError("seed", "must be non-empty text");
  validateMembers(spec.members);
  if (spec.sampling !== "latin-hypercube" && spec.sampling !== "monte-carlo")
    throw new SpecError("sampling", 'must be "latin-hypercube" or "monte-carlo"');
  if (!Array.isArray(spec.percentiles) || spec.percentiles.length === 0)
    throw new SpecError("percentiles", "must list at least one percentile");
  checkBoundedUniqueList(spec.percentiles, MAX_PERCENTILES, "percentiles");
  checkBoundedUniqueList(spec.thresholds, MAX_THRESHOLDS, "thresholds");
  checkBoundedUniqueList(spec.horizons, MAX_HORIZONS, "horizons");
  spec.percentiles.forEach((p, i) => {
    if (!(Number.isFinite(p) && p > 0 && p < 100)) throw new SpecError(`percentiles[${i}]`, "must lie strictly between 0 and 100");
  });
  spec.thresholds.forEach((t, i) => {
    if (!Number.isFinite(t)) throw new SpecError(`thresholds[${i}]`, "must be finite");
  });
  spec.horizons.forEach((h, i) => {
    if (!Number.isInteger(h)) throw new SpecError(`horizons[${i}]`, "must be a whole year");
  });
  const [b0, b1] = spec.baseline;
  if (!Number.isInteger(b0) || !Number.isInteger(b1)) throw new SpecError("baseline", "must be two whole years");
  if (b1 < b0) throw new SpecError("baseline", `baseline ${b0}–${b1} ends before it starts`);
  validateModel(spec);
  if (!Array.isArray(spec.pathways) || spec.pathways.length === 0)
    throw new SpecError("pathways", "must hold at least one pathway");
  if (spec.pathways.length > MAX_PATHWAYS_PER_RUN)
    throw new SpecError("pathways", `must hold at most ${MAX_PATHWAYS_PER_RUN} pathways (the limit per run)`);
  const ids = new Set<string>();
  spec.pathways.forEach((pathway, i) => {
    if (typeof pathway.id !== "string" || pathway.id.length === 0) throw new SpecError(`pathways[${i}].id`, "must not be empty");
    if (ids.has(pathway.id)) throw new SpecError(`pathways[${i}].id`, `"${pathway.id}" is used twice`);
    ids.add(pathway.id);
    validatePathwayYears(spec, i, validatePathwaySeries(spec, i));
  });
  validatePerilInputs(spec.perils, spec.portfolio, spec.baseline);
}

/** At most `max` values, none twice (a repeat is named with the first one's position). */
function checkBoundedUniqueList(list: number[], max: number, field: string): void {
  if (list.length > max) throw new SpecError(field, `must list at most ${max} values (the limit per run)`);
  const first = new Map<number, number>();
  list.forEach((value, i) => {
    const earlier = first.get(value);
    if (earlier !== undefined) throw new SpecError(`${field}[${i}]`, `repeats ${value} (already ${field}[${earlier}])`);
    first.set(value, i);
  });
}

export function validateMembers(members: number): void {
  if (!Number.isInteger(members)) throw new SpecError("members", "must be a whole number");
  if (members < 1) throw new SpecError("members", "must be at least 1");
  if (members > MAX_MEMBERS) throw new SpecError("members", `must be at most ${MAX_MEMBERS}`);
}

/** Checks each agent's series; returns the number of years the pathway covers. */
function validatePathwaySeries(spec: RunSpec, i: number): number {
  const pathway = spec.pathways[i]!;
  if (!Number.isInteger(pathway.startYear)) throw new SpecError(`pathways[${i}].startYear`, "must be a whole year");
  if (pathway.startYear < MIN_YEAR || pathway.startYear > MAX_YEAR)
    throw new SpecError(`pathways[${i}].startYear`, `must be a year from ${MIN_YEAR} to ${MAX_YEAR}`);
  const entries = Object.entries(pathway.agents ?? {}).filter(([, s]) => s !== undefined);
  if (entries.length === 0) throw new SpecError(`pathways[${i}].agents`, "must hold at least one agent");
  // The length most agents share is the expected one, so the odd series out is the one named.
  const lengths = entries.map(([, series]) => {
    const values = Object.values(series as Record<string, unknown>)[0];
    return Array.isArray(values) ? values.length : -1;
  });
  const expected = modalLength(lengths);
  if (expected < 1 || expected > MAX_PATHWAY_YEARS) {
    const [agent, series] = entries[lengths.indexOf(expected)]!;
    throw new SpecError(
      `pathways[${i}].agents.${agent}.${Object.keys(series)[0]}`,
      `has ${expected} values, expected 1 to ${MAX_PATHWAY_YEARS}`,
    );
  }
  for (const [agent, series] of entries) {
    const field = `pathways[${i}].agents.${agent}`;
    if (!(FORCING_AGENTS as readonly string[]).includes(agent))
      throw new SpecError(field, `is not a forcing agent (one of ${FORCING_AGENTS.join(", ")})`);
    const keys = Object.keys(series);
    const concentrationKey = CONCENTRATION_KEYS[agent as keyof typeof CONCENTRATION_KEYS] as string | undefined;
    const allowed = concentrationKey ? ["erf", concentrationKey] : ["erf"];
    if (keys.length !== 1 || !allowed.includes(keys[0]!))
      throw new SpecError(field, `must be ${allowed.map((k) => `{ "${k}": [..] }`).join(" or ")}`);
    const key = keys[0]!;
    const values = (series as Record<string, unknown>)[key];
    if (!Array.isArray(values)) throw new SpecError(`${field}.${key}`, "must be an array of numbers");
    values.forEach((v, t) => {
      if (typeof v !== "number" || !Number.isFinite(v)) throw new SpecError(`${field}.${key}[${t}]`, "must be finite");
      if (key !== "erf" && v < 0) throw new SpecError(`${field}.${key}[${t}]`, "must not be negative (a concentration)");
      if (key !== "erf" && v === 0)
        throw new SpecError(`${field}.${key}[${t}]`, "must be > 0 (the forcing expressions take its logarithm)");
    });
    if (values.length !== expected) throw new SpecError(`${field}.${key}`, `has ${values.length} values, expected ${expected}`);
  }
  const last = pathway.startYear + expected - 1;
  if (last > MAX_YEAR)
    throw new SpecError(
      `pathways[${i}].startYear`,
      `with ${expected} yearly values runs to ${last}; years must lie from ${MIN_YEAR} to ${MAX_YEAR}`,
    );
  return expected;
}

/** The most frequent length; on a tie the longest (a cut-short series is the usual mistake). */
export function modalLength(lengths: number[]): number {
  let best = lengths[0] ?? 0;
  let bestCount = 0;
  for (const length of lengths) {
    const count = lengths.filter((l) => l === length).length;
    if (count > bestCount || (count === bestCount && length > best)) {
      best = length;
      bestCount = count;
    }
  }
  return best;
}

function validatePathwayYears(spec: RunSpec, i: number, length: number): void {
  const first = spec.pathways[i]!.startYear;
  const last = first + length - 1;
  const where = `the pathway years ${first}–${last} (pathways[${i}])`;
  const [b0, b1] = spec.baseline;
  if (b0 < first || b1 > last) throw new SpecError("baseline", `baseline ${b0}–${b1} lies outside ${where}`);
  spec.horizons.forEach((h, j) => {
    if (h < first || h > last) throw new SpecError(`horizons[${j}]`, `${h} lies outside ${where}`);
  });
  const c = spec.model.constraint;
  if (c && (c.from < first || c.to > last))
    throw new SpecError("model.constraint", `window ${c.from}–${c.to} lies outside ${where}`);
}

function validateModel(spec: RunSpec): void {
  const model = spec.model;
  if (!(FORCING_EXPRESSIONS as readonly string[]).includes(model.forcingExpression))
    throw new SpecError("model.forcingExpression", `must be one of ${FORCING_EXPRESSIONS.join(", ")}`);
  for (const input of CLIMATE_INPUTS) {
    const d = model.climate?.[input];
    if (!d) throw new SpecError(`model.climate.${input}`, "is missing");
    checkDistribution(d, `model.climate.${input}`);
    // Every climate input is a positive physical quantity; a fixed one that is not would make
    // every member fail, so it is refused with the spec rather than at sampling.
    if (d.type === "fixed" && !(d.value > 0)) throw new SpecError(`model.climate.${input}.value`, "must be > 0 (a physical input)");
  }
  for (const [agent, entry] of Object.entries(model.agents)) {
    if (!(FORCING_AGENTS as readonly string[]).includes(agent))
      throw new SpecError(`model.agents.${agent}`, `is not a forcing agent (one of ${FORCING_AGENTS.join(", ")})`);
    if (!entry?.scale) throw new SpecError(`model.agents.${agent}.scale`, "is missing");
    checkDistribution(entry.scale, `model.agents.${agent}.scale`);
  }
  const c = model.constraint;
  if (c) {
    if (!Number.isInteger(c.from)) throw new SpecError("model.constraint.from", "must be a whole year");
    if (!Number.isInteger(c.to)) throw new SpecError("model.constraint.to", "must be a whole year");
    if (c.to < c.from) throw new SpecError("model.constraint.to", "must not be before from");
    if (!Number.isFinite(c.observed)) throw new SpecError("model.constraint.observed", "must be finite");
    if (!(Number.isFinite(c.sd) && c.sd > 0)) throw new SpecError("model.constraint.sd", "must be > 0");
    if (!(Number.isFinite(c.internalVariability) && c.internalVariability >= 0))
      throw new SpecError("model.constraint.internalVariability", "must be a finite number ≥ 0");
  }
  const pairs = new Set<string>();
  model.correlations.forEach((correlation, i) => {
    const field = `model.correlations[${i}]`;
    if (!(Number.isFinite(correlation.rank) && correlation.rank > -1 && correlation.rank < 1))
      throw new SpecError(`${field}.rank`, "must lie strictly between -1 and 1");
    const [a, b] = correlation.between;
    [a, b].forEach((name, j) => {
      if (!isUncertainInput(spec, name))
        throw new SpecError(
          `${field}.between[${j}]`,
          (CLIMATE_INPUTS as readonly string[]).includes(name) || (FORCING_AGENTS as readonly string[]).includes(name)
            ? `"${name}" is fixed in this model: only uncertain inputs can be correlated`
            : `"${name}" is not an input (one of ${[...CLIMATE_INPUTS, ...FORCING_AGENTS].join(", ")})`,
        );
    });
    if (a === b) throw new SpecError(`${field}.between`, "must name two different inputs");
    const key = [a, b].sort().join("|");
    if (pairs.has(key)) throw new SpecError(`${field}.between`, "repeats a pair already given");
    pairs.add(key);
  });
}

function checkDistribution(d: unknown, field: string): void {
  try {
    validateDistribution(d as never, field);
  } catch (error) {
    throw SpecError.fromRangeError(field, error);
  }
}

/** An input drawn from a distribution that is not "fixed": it takes part in sampling. */
export function isUncertainInput(spec: RunSpec, name: string): boolean {
  if ((CLIMATE_INPUTS as readonly string[]).includes(name))
    return spec.model.climate[name as (typeof CLIMATE_INPUTS)[number]].type !== "fixed";
  const entry = spec.model.agents[name as ForcingAgent];
  return entry !== undefined && entry.scale.type !== "fixed";
}
