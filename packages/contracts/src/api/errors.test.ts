import { describe, expect, it } from "vitest";
import { z } from "zod";
import { issueDetails } from "./errors.js";

describe("issueDetails", () => {
  const schema = z.object({ members: z.number().min(1, "must be at least 1"), pathways: z.array(z.object({ id: z.string() })) }).strict();

  it("writes each issue's path as users write it, after the prefix", () => {
    const parsed = schema.safeParse({ members: 0, pathways: [{ id: "a" }, { id: 2 }] });
    expect(parsed.success).toBe(false);
    const details = issueDetails(parsed.error!, { prefix: "spec." });
    expect(details).toContainEqual({ path: "spec.members", message: "must be at least 1" });
    expect(details.map((d) => d.path)).toContain("spec.pathways[1].id");
  });

  it("names the fallback when the issue is about the whole value", () => {
    const parsed = schema.safeParse("not an object");
    expect(issueDetails(parsed.error!, { fallback: "body" })[0]!.path).toBe("body");
  });
});
