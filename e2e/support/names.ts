/**
 * Names the flows give to what they create, so a later flow finds the earlier one's work
 * (the specs run in file order in one worker against one server; see playwright.config.ts).
 */
export const names = {
  uploadedPathway: "Northmere stress test (uploaded)",
  rejectedPathway: "Broken upload",
  widerDraft: "Core assumptions, wider aerosol–cloud",
  managerOwnDraft: "Manager's own tweak",
  runOnWider: "Wider aerosol–cloud: three pathways",
  runOnPrevious: "Core v1: three pathways",
  runOnPreviousOtherSeed: "Core v1: another seed",
  actuaryRun: "Q3 ORSA: flood and heat lens",
  hotterDraft: "Core assumptions, ECS median 4 K trial",
  runToCancel: "Large run, cancelled",
  invitedUser: { email: "newcomer@harbourline.example", name: "Noor Castellan" },
} as const;

/** The seeded, approved parent every new draft starts from (seeds/src/model-versions). */
export const seededVersionName = "Harbourline Core Assumptions";
/** Three of the seeded pathways (seeds/src/pathways): low, middle, high stories. */
export const seededPathways = ["Harbourline Low", "Harbourline Middle", "Harbourline High"] as const;
/** Small ensembles keep the suite quick on a 2-core machine (issue 6: 2,000–5,000 members). */
export const members = 4000;
