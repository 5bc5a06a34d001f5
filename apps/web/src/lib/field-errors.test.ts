import { describe, expect, it } from "vitest";
import { z } from "zod";
import { fieldErrors } from "./field-errors";

describe("fieldErrors", () => {
  it("keeps the first message of each field, in the schema's order of checks", () => {
    const schema = z.object({ email: z.email("Enter a valid email address"), password: z.string().min(10, "At least 10 characters").max(3, "Too long") });
    const parsed = schema.safeParse({ email: "nope", password: "short" });
    expect(parsed.success).toBe(false);
    expect(fieldErrors(parsed.error!)).toEqual({ email: "Enter a valid email address", password: "At least 10 characters" });
  });
});
