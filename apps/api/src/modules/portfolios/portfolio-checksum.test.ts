import { describe, expect, it } from "vitest";
import { portfolioChecksum } from "./portfolio-checksum.js";

describe("portfolioChecksum", () => {
  it("is SHA-256 of the RFC 8785 text of the rows' figures, in file order", () => {
    const row = { region: "North", peril: "flood", currency: "GBP", aal: 1_200_000, loss100: 35_000_000, loss200: 52_000_000 };
    // Python: hashlib.sha256(b'[{"aal":1200000,"currency":"GBP","loss100":35000000,"loss200":52000000,"peril":"flood","region":"North"}]').hexdigest()
    expect(portfolioChecksum([row])).toBe("4aabee2087248fac7c19985a5c8ed6313acd99c6e8acd28347d28af18ee2c546");
  });
});
