import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { signIn, type SignedInAgent } from "../test-support/sign-in.js";
import { createTestContext, TEST_ORIGIN, type TestContext } from "../test-support/test-context.js";
import { testPathwayBody } from "../modules/runs/runs.fixtures.js";

// Malformed requests used to answer 500 with the full SQL in the log. Each must now get a clear
// 4xx and log nothing as a server failure.

let t: TestContext;
let analyst: SignedInAgent;
let admin: SignedInAgent;
let manager: SignedInAgent;
let logged: ReturnType<typeof vi.spyOn>;
beforeAll(async () => {
  t = await createTestContext();
  [analyst, admin, manager] = await Promise.all([signIn(t.app, "analyst"), signIn(t.app, "admin"), signIn(t.app, "manager")]);
  logged = vi.spyOn(console, "error");
});
afterAll(async () => {
  logged.mockRestore();
  await t.close();
});

function expectNoServerLog() {
  const serverFailures = logged.mock.calls.filter((call: unknown[]) => String(call[0]).startsWith("[api]"));
  expect(serverFailures).toEqual([]);
}

describe("malformed multipart", () => {
  it("answers 400 for multipart with no boundary", async () => {
    const res = await analyst.post("/api/pathways/upload").set("Content-Type", "multipart/form-data").send("--x\r\n");
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("malformed_multipart");
    expectNoServerLog();
  });

  it("answers 400 for truncated multipart", async () => {
    const body = '--XyZ\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\nContent-Type: text/csv\r\n\r\nyear,co2_ppm\n2000,3';
    const res = await analyst.post("/api/portfolios/upload").set("Content-Type", "multipart/form-data; boundary=XyZ").send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("malformed_multipart");
    expectNoServerLog();
  });
});

describe("content encodings", () => {
  it("answers 415 for Content-Encoding: bogus", async () => {
    const res = await analyst.post("/api/pathways").set("Content-Type", "application/json").set("Content-Encoding", "bogus").send(JSON.stringify(testPathwayBody()));
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe("unsupported_content_encoding");
    expectNoServerLog();
  });

  it("answers 400 for gzip declared on a plain body", async () => {
    const res = await analyst.post("/api/pathways").set("Content-Type", "application/json").set("Content-Encoding", "gzip").send(JSON.stringify(testPathwayBody()));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("malformed_body");
    expectNoServerLog();
  });
});

describe("a NUL byte in an id", () => {
  const id = "abc%00def";
  const cases: Array<[string, () => Promise<{ status: number; body: { error: { code: string } } }>]> = [
    ["GET /api/pathways/:id", () => analyst.get(`/api/pathways/${id}`)],
    ["PATCH /api/pathways/:id", () => analyst.patch(`/api/pathways/${id}`).send({ name: "x" })],
    ["GET /api/model-versions/:id", () => analyst.get(`/api/model-versions/${id}`)],
    ["GET /api/model-versions/:id/diff", () => analyst.get(`/api/model-versions/${id}/diff`)],
    ["POST /api/model-versions/:id/submit", () => analyst.post(`/api/model-versions/${id}/submit`).send({ changeClass: "minor" })],
    ["POST /api/model-versions/:id/approve", () => manager.post(`/api/model-versions/${id}/approve`).send({ comment: "ok" })],
    ["GET /api/runs/:id", () => analyst.get(`/api/runs/${id}`)],
    ["POST /api/runs/:id/cancel", () => analyst.post(`/api/runs/${id}/cancel`)],
    ["GET /api/runs/:id/result", () => analyst.get(`/api/runs/${id}/result`)],
    ["GET /api/runs/:id/statements", () => analyst.get(`/api/runs/${id}/statements`)],
    ["GET /api/runs/:id/workbook.xlsx", () => analyst.get(`/api/runs/${id}/workbook.xlsx`)],
    ["GET /api/peril-profiles/:id", () => analyst.get(`/api/peril-profiles/${id}`)],
    ["GET /api/portfolios/:id", () => analyst.get(`/api/portfolios/${id}`)],
    ["PATCH /api/users/:id", () => admin.patch(`/api/users/${id}`).send({ role: "analyst", reason: "NUL id check" })],
    ["GET /api/outbox/:id", () => admin.get(`/api/outbox/${id}`)],
  ];
  it.each(cases)("answers 400 on %s", async (_name, send) => {
    const res = await send();
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid_characters");
    expectNoServerLog();
  });

  it("answers 400 naming the field for a NUL byte in a JSON body id or a query value", async () => {
    const body = await analyst.post("/api/runs").send({ modelVersionId: "v\u0000x", pathwayIds: ["p"], members: 10, seed: "s", sampling: "monte-carlo" });
    expect(body.status).toBe(400);
    expect(body.body.error.details).toEqual([{ path: "modelVersionId", message: "contains a control character (NUL)" }]);
    const query = await analyst.get("/api/model-versions/x/diff?against=a%00b").set("Origin", TEST_ORIGIN);
    expect(query.status).toBe(400);
    expectNoServerLog();
  });
});
