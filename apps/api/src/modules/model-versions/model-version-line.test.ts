import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signIn, type SignedInAgent } from "../../test-support/sign-in.js";
import { createTestContext, type TestContext } from "../../test-support/test-context.js";
import { testModelVersionBody } from "../runs/runs.fixtures.js";

let t: TestContext;
let analyst: SignedInAgent;
beforeAll(async () => {
  t = await createTestContext();
  analyst = await signIn(t.app, "analyst");
});
afterAll(async () => t.close());

/** Creates a version through the API and answers its id and number. */
async function draft(name: string, parentId: string | null = null) {
  const res = await analyst.post("/api/model-versions").send({ ...testModelVersionBody({ name }), parentId });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { id: res.body.id as string, versionNumber: res.body.versionNumber as number, parentId: res.body.parentId as string | null };
}

describe("version numbers count within a version's own line of descent", () => {
  it("continues the parent's line under the same name, and starts a renamed copy at v1 with its parent kept", async () => {
    const base1 = await draft("Line base");
    const base2 = await draft("Line base", base1.id);
    expect([base1.versionNumber, base2.versionNumber]).toEqual([1, 2]);

    // Before: a renamed copy of v2 took the family's next number and read "Line constrained v3".
    const constrained1 = await draft("Line constrained", base2.id);
    expect(constrained1).toMatchObject({ versionNumber: 1, parentId: base2.id });
    const constrained2 = await draft("Line constrained", constrained1.id);
    expect(constrained2.versionNumber).toBe(2);

    // The original line goes on where it was.
    expect((await draft("Line base", base2.id)).versionNumber).toBe(3);
  });

  it("renumbers a draft renamed while editing, and back when it takes its parent's name again", async () => {
    const parent = await draft("Edit base");
    const child = await draft("Edit base", parent.id);
    expect(child.versionNumber).toBe(2);

    const renamed = await analyst.patch(`/api/model-versions/${child.id}`).send({ name: "Edit stress" });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({ name: "Edit stress", versionNumber: 1, parentId: parent.id });

    const notesOnly = await analyst.patch(`/api/model-versions/${child.id}`).send({ notes: "only the notes" });
    expect(notesOnly.body.versionNumber).toBe(1);

    const back = await analyst.patch(`/api/model-versions/${child.id}`).send({ name: "Edit base" });
    expect(back.body.versionNumber).toBe(2);

    const audit = await t.ctx.models.AuditEvent.findAll({
      where: { action: "model-version.updated", entityId: child.id },
      order: [["createdAt", "ASC"]],
    });
    expect(audit.map((a) => a.summary)).toEqual([
      'Draft "Edit base" v2 edited (name); renumbered v1 in its line of descent.',
      'Draft "Edit stress" v1 edited (notes).',
      'Draft "Edit stress" v1 edited (name); renumbered v2 in its line of descent.',
    ]);
  });
});
