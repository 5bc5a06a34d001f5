import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { permissionsByRole } from "@plumeline/contracts";
import { signIn } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(async () => {
  await t.close();
});

describe("GET /api/me and GET /api/health", () => {
  // Expected permission sets are the role table of docs/API.md, written out here independently.
  it.each([
    ["analyst", ["pathways:write", "model-versions:write", "runs:create", "exports:create", "perils:write"], ["model-versions:decide", "audit:read", "users:manage"]],
    ["actuary", ["runs:create", "exports:create", "perils:write"], ["pathways:write", "model-versions:write", "model-versions:decide"]],
    ["manager", ["model-versions:decide", "audit:read", "exports:create"], ["runs:create", "pathways:write", "users:manage"]],
    ["admin", ["users:manage", "outbox:read", "audit:read"], ["runs:create", "exports:create", "model-versions:decide"]],
  ] as const)("%s gets its permissions from the one role table", async (role, has, lacks) => {
    const agent = await signIn(t.app, role);
    const res = await agent.get("/api/me");
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe(role);
    expect(res.body.permissions).toEqual([...permissionsByRole[role]]);
    for (const p of has) expect(res.body.permissions).toContain(p);
    for (const p of lacks) expect(res.body.permissions).not.toContain(p);
  });

  it("answers 401 without a session", async () => {
    expect((await request(t.app).get("/api/me")).status).toBe(401);
  });

  it("reports health without a session", async () => {
    const res = await request(t.app).get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, engineVersion: expect.any(String) });
  });

  it("answers unknown API paths with a JSON 404", async () => {
    const res = await request(t.app).get("/api/no-such-thing");
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not_found");
  });
});
