import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";

let t: TestContext;
let admin: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  admin = await signIn(t.app, "admin");
});
afterAll(async () => {
  await t.close();
});

describe("outbox (embedded SMTP server -> outbox_messages)", () => {
  it("stores a mail sent over real SMTP and serves it through the API", async () => {
    const delivered = await t.ctx.mailer.send({
      to: ["manager@harbourline.example", "manager2@harbourline.example"],
      subject: "Model version 4 is waiting for your review",
      text: "Ines Calloway submitted version 4 (minor change).",
      html: "<p>Ines Calloway submitted version 4 (minor change).</p>",
    });
    expect(delivered).toBe(true);

    const list = await admin.get("/api/outbox");
    expect(list.status).toBe(200);
    const summary = list.body.find((m: { subject: string }) => m.subject === "Model version 4 is waiting for your review");
    expect(summary).toMatchObject({ to: ["manager@harbourline.example", "manager2@harbourline.example"], from: expect.stringContaining("no-reply@plumeline.invalid") });
    expect(summary.text).toBeUndefined();

    const full = await admin.get(`/api/outbox/${summary.id}`);
    expect(full.status).toBe(200);
    expect(full.body.text.trim()).toBe("Ines Calloway submitted version 4 (minor change).");
    expect(full.body.html).toContain("<p>");
  });

  it("logs and audits a send failure without throwing", async () => {
    const { createMailer } = await import("../../mail/mailer.js");
    const failures: string[] = [];
    // Port 9 on loopback: nothing listens there, so the connection is refused.
    const broken = createMailer({ transport: { host: "127.0.0.1", port: 9 }, from: "x@plumeline.invalid", onFailure: (m) => void failures.push(m.subject) });
    const original = console.error;
    console.error = () => {};
    const delivered = await broken.send({ to: ["a@harbourline.example"], subject: "lost", text: "…" });
    console.error = original;
    broken.close();
    expect(delivered).toBe(false);
    expect(failures).toEqual(["lost"]);
  });

  it("answers 404 for an unknown id and 400 for a malformed one", async () => {
    expect((await admin.get("/api/outbox/999999")).status).toBe(404);
    const bad = await admin.get("/api/outbox/abc");
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe("id");
  });

  it("answers 401 without a session and 403 for roles without outbox:read", async () => {
    expect((await request(t.app).get("/api/outbox")).status).toBe(401);
    const manager = await signIn(t.app, "manager");
    expect((await manager.get("/api/outbox")).status).toBe(403);
  });
});
