import { describe, expect, it } from "vitest";
import { formatTimeLeft, secondsLeft } from "./time-left";

describe("time left", () => {
  it("extrapolates the rate seen so far (closed form: (1 − p) / rate)", () => {
    // 10 % to 30 % in 4 s: 5 %/s, so the remaining 70 % takes 14 s.
    expect(secondsLeft({ at: 1000, progress: 0.1 }, { at: 5000, progress: 0.3 })).toBeCloseTo(14, 10);
  });

  it("says nothing before 2 s of watching, without movement, or once done", () => {
    expect(secondsLeft(null, { at: 5000, progress: 0.3 })).toBeNull();
    expect(secondsLeft({ at: 1000, progress: 0.1 }, { at: 2500, progress: 0.3 })).toBeNull();
    expect(secondsLeft({ at: 1000, progress: 0.3 }, { at: 9000, progress: 0.3 })).toBeNull();
    expect(secondsLeft({ at: 1000, progress: 0.1 }, { at: 9000, progress: 1 })).toBeNull();
  });

  it("words the estimate as an estimate", () => {
    expect(formatTimeLeft(3)).toBe("less than 5 s left");
    expect(formatTimeLeft(42)).toBe("about 40 s left");
    expect(formatTimeLeft(200)).toBe("about 3 min left");
  });
});
