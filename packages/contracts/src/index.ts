export * from "./engine/agents.js";
export * from "./engine/distribution.js";
export * from "./engine/run-spec.js";
export * from "./engine/run-result.js";
export * from "./engine/format-issues.js";
