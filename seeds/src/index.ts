export * from "./organisation.js";
export * from "./users.js";
// Domain seed data (pathways, model versions) and peril seed data are exported below.
export * from "./pathways/index.js";
export * from "./model-versions/index.js";
export * from "./perils/index.js";
