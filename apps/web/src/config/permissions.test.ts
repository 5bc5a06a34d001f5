import { describe, expect, it } from "vitest";
import { PERMISSION_HOLDERS } from "./permissions";

describe("PERMISSION_HOLDERS", () => {
  it("names the holders of each permission as the role table in docs/API.md states them", () => {
    expect(PERMISSION_HOLDERS["pathways:read"]).toBe("any signed-in role");
    expect(PERMISSION_HOLDERS["model-versions:decide"]).toBe("the manager role");
    expect(PERMISSION_HOLDERS["runs:create"]).toBe("the analyst or actuary role");
    expect(PERMISSION_HOLDERS["exports:create"]).toBe("the analyst, actuary or manager role");
    expect(PERMISSION_HOLDERS["audit:read"]).toBe("the manager or admin role");
    expect(PERMISSION_HOLDERS["users:manage"]).toBe("the admin role");
  });
});
