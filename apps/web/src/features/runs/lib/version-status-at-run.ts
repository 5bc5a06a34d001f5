import type { ModelVersion } from "@plumeline/contracts";

type VersionTimes = Pick<ModelVersion, "status" | "submittedAt" | "decidedAt">;

/**
 * What an exploratory run's model version was when the run was made, in words for the banner.
 * The run keeps only that its version was not approved, and the version's status now may have
 * moved on (a draft run, then submitted, is "in review" today), so the state is read back from
 * the version's own submission and decision times: a version is a draft until it is submitted,
 * in review until it is decided. Until the version is known the banner says only "not approved".
 */
export function versionStateWhenRunMade(version: VersionTimes | undefined, runCreatedAt: string): string {
  if (!version) return "not approved";
  const at = Date.parse(runCreatedAt);
  const reached = (iso: string | null) => iso !== null && Date.parse(iso) <= at;
  if (reached(version.decidedAt)) return version.status === "rejected" ? "rejected" : "not approved";
  if (reached(version.submittedAt)) return "in review";
  return "a draft";
}
