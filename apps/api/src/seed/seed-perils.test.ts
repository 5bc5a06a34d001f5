import { demoPerilProfiles, demoPortfolioCsv } from "@plumeline/seeds";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn } from "../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../test-support/test-context.js";
import { seedPerils } from "./seed-perils.js";

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(async () => {
  await t.close();
});

describe("seedPerils", () => {
  it("stores the demo profiles and a portfolio whose checksum equals an upload of the demo CSV", async () => {
    expect(await seedPerils(t.ctx, t.userIds)).toEqual({ profiles: demoPerilProfiles.length, portfolioRows: 5 });
    const actuary = await signIn(t.app, "actuary");
    const profiles = await actuary.get("/api/peril-profiles");
    expect(profiles.body.items.map((p: { id: string }) => p.id).sort()).toEqual(demoPerilProfiles.map((p) => p.id).sort());
    const [portfolio] = (await actuary.get("/api/portfolios")).body;
    const preview = await actuary.post("/api/portfolios/upload").field("preview", "true").attach("file", Buffer.from(demoPortfolioCsv()), "demo.csv");
    expect(portfolio.checksum).toBe(preview.body.checksum);
    expect(await t.ctx.models.AuditEvent.count({ where: { action: "peril-profile.created" } })).toBe(demoPerilProfiles.length);
  });
});
