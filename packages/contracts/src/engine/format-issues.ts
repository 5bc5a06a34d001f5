import type { z } from "zod";

/** Renders a path the way users write it: pathways[1].agents.co2.ppm */
export function formatPath(path: ReadonlyArray<PropertyKey>): string {
  let out = "";
  for (const part of path) {
    if (typeof part === "number") out += `[${part}]`;
    else out += out === "" ? String(part) : `.${String(part)}`;
  }
  return out;
}

/** One readable line per problem, each naming its field: "model.climate.ecs.sd must be > 0". */
export function formatIssues(error: z.ZodError): string[] {
  return error.issues.map((issue) => {
    const where = formatPath(issue.path);
    // A message that already opens with its field ("baseline 1700–1720 lies outside …") stands alone.
    return where && !issue.message.startsWith(`${where} `) ? `${where} ${issue.message}` : issue.message;
  });
}
