import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";

let t: TestContext;
let admin: SignedInAgent;
let analyst: SignedInAgent;
let manager: SignedInAgent;

beforeAll(async () => {
  t = await createTestContext();
  [admin, analyst, manager] = await Promise.all([signIn(t.app, "admin"), signIn(t.app, "analyst"), signIn(t.app, "manager")]);
});
afterAll(async () => t.close());

describe("GET/PUT /api/settings/materiality", () => {
  it("starts from the defaults of common practice (0.1 K, 5 points, 10 % of the width), readable by an analyst", async () => {
    // Defaults asked for by the firm's review policy; common practice, not a published standard.
    const res = await analyst.get("/api/settings/materiality");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ policy: { medianShiftK: 0.1, exceedancePoints: 5, widthChangePercent: 10 }, customised: false, updatedAt: null, updatedByName: null });
  });

  it("refuses to let anyone but an admin set it (401 without a session, 403 for analyst and manager)", async () => {
    const body = { medianShiftK: 0.2, exceedancePoints: 5, widthChangePercent: 10, reason: "trying" };
    expect((await request(t.app).put("/api/settings/materiality").send(body)).status).toBe(401);
    for (const agent of [analyst, manager]) {
      const res = await agent.put("/api/settings/materiality").send(body);
      expect(res.status).toBe(403);
      expect(res.body.error.message).toContain("settings:manage");
    }
    expect(await t.ctx.models.Setting.count()).toBe(0);
  });

  it("answers 400 naming each bad field, the reason included", async () => {
    const res = await admin.put("/api/settings/materiality").send({ medianShiftK: 0, exceedancePoints: 101, widthChangePercent: "ten" });
    expect(res.status).toBe(400);
    const paths = (res.body.error.details as Array<{ path: string }>).map((d) => d.path).sort();
    expect(paths).toEqual(["exceedancePoints", "medianShiftK", "reason", "widthChangePercent"]);
  });

  it("lets an admin change it, audited with the old and new values and the reason", async () => {
    const res = await admin.put("/api/settings/materiality").send({ medianShiftK: 0.15, exceedancePoints: 4, widthChangePercent: 12, reason: "Board review of the model policy" });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ policy: { medianShiftK: 0.15, exceedancePoints: 4, widthChangePercent: 12 }, customised: true, updatedByName: expect.any(String) });
    expect((await manager.get("/api/settings/materiality")).body.policy).toEqual({ medianShiftK: 0.15, exceedancePoints: 4, widthChangePercent: 12 });
    const audit = await t.ctx.models.AuditEvent.findOne({ where: { action: "settings.materiality-changed" } });
    expect(audit?.summary).toContain("Board review of the model policy");
    expect(audit?.data).toEqual({
      from: { medianShiftK: 0.1, exceedancePoints: 5, widthChangePercent: 10 },
      to: { medianShiftK: 0.15, exceedancePoints: 4, widthChangePercent: 12 },
      reason: "Board review of the model policy",
    });
    // A second change records the first change's values as "from" (one row per key, updated in place).
    await admin.put("/api/settings/materiality").send({ medianShiftK: 0.1, exceedancePoints: 5, widthChangePercent: 10, reason: "Back to the defaults" });
    const rows = await t.ctx.models.AuditEvent.findAll({ where: { action: "settings.materiality-changed" }, order: [["createdAt", "ASC"]] });
    expect(rows).toHaveLength(2);
    expect((rows[1]!.data as { from: unknown }).from).toEqual({ medianShiftK: 0.15, exceedancePoints: 4, widthChangePercent: 12 });
    expect(await t.ctx.models.Setting.count()).toBe(1);
  });
});
