import { describe, expect, it } from "vitest";
import { formatUtcDateTime } from "./time-format.js";

describe("formatUtcDateTime", () => {
  // Expected values worked by hand from the ISO 8601 offset rule: UTC = local time − offset.
  it("writes a moment in UTC, to the minute unless seconds are asked for, and says UTC", () => {
    expect(formatUtcDateTime("2026-12-05T14:03:59.999Z")).toBe("2026-12-05 14:03 UTC");
    expect(formatUtcDateTime("2026-12-05T14:03:59.999Z", { seconds: true })).toBe("2026-12-05 14:03:59 UTC");
    expect(formatUtcDateTime("2026-12-06T00:30:00+01:00")).toBe("2026-12-05 23:30 UTC");
    expect(formatUtcDateTime(new Date(Date.UTC(2026, 0, 1, 0, 0, 7)), { seconds: true })).toBe("2026-01-01 00:00:07 UTC");
  });

  it("gives back text that is not a time unchanged", () => {
    expect(formatUtcDateTime("not yet")).toBe("not yet");
  });
});
