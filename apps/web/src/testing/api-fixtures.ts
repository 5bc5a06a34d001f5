import type { ModelVersion, RunSummary } from "@plumeline/contracts";

/** Objects shaped like the API's answers (contracts schemas), for hook and page tests. */
export function runSummary(over: Partial<RunSummary> = {}): RunSummary {
  return {
    id: "run-1",
    name: "Three pathways",
    status: "running",
    progress: 0.4,
    exploratory: false,
    modelVersion: { id: "mv-1", name: "Core", versionNumber: 1, status: "approved" },
    pathwayIds: ["p1"],
    members: 1000,
    seed: "s",
    sampling: "latin-hypercube",
    perilProfileIds: [],
    portfolioId: null,
    createdBy: "u-analyst",
    createdByName: "Ines",
    createdAt: "2026-01-01T00:00:00.000Z",
    startedAt: null,
    finishedAt: null,
    error: null,
    cancelRequested: false,
    ...over,
  };
}

export function modelVersion(over: Partial<ModelVersion> = {}): ModelVersion {
  return {
    id: "mv-2",
    name: "Core",
    versionNumber: 2,
    status: "in-review",
    parentId: "mv-1",
    changeClass: "minor",
    authorId: "u-analyst",
    authorName: "Ines",
    createdAt: "2026-01-01T00:00:00.000Z",
    updatedAt: "2026-01-01T00:00:00.000Z",
    submittedAt: "2026-01-01T00:00:00.000Z",
    decidedBy: null,
    decidedByName: null,
    decidedAt: null,
    model: {
      climate: {
        ecs: { type: "range", p50: 3, low: 2, high: 5, coverage: 90, shape: "lognormal" },
        f2x: { type: "fixed", value: 3.93 },
        upperHeatCapacity: { type: "fixed", value: 7.3 },
        deepHeatCapacity: { type: "fixed", value: 106 },
        heatExchange: { type: "fixed", value: 0.73 },
        deepEfficacy: { type: "fixed", value: 1.28 },
      },
      agents: {},
      correlations: [],
      constraint: null,
      forcingExpression: "ar6",
    },
    defaults: { percentiles: [5, 17, 50, 83, 95], thresholds: [1.5, 2, 3], horizons: [2030, 2050, 2100], baseline: [1850, 1900] },
    notes: "",
    submissionNote: null,
    decisionComment: null,
    retiredAt: null,
    pathwayIds: [],
    perilProfileIds: [],
    ...over,
  };
}

export const analystMe = {
  user: { id: "u-analyst", email: "analyst@example.test", name: "Ines Calloway", role: "analyst" },
  permissions: ["pathways:read", "pathways:write", "model-versions:read", "model-versions:write", "runs:read", "runs:create", "exports:create", "perils:read", "perils:write"],
  mustChangePassword: false,
};

export const managerMe = {
  user: { id: "u-manager", email: "manager@example.test", name: "Marit Oyelaran", role: "manager" },
  permissions: ["pathways:read", "model-versions:read", "model-versions:decide", "runs:read", "exports:create", "perils:read", "audit:read"],
  mustChangePassword: false,
};
