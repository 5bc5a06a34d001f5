import { describe, expect, it } from "vitest";
import { pathwayChecksum } from "./pathway-checksum.js";

describe("pathwayChecksum", () => {
  it("is SHA-256 of the RFC 8785 text of { startYear, agents } only", () => {
    // Python: hashlib.sha256(b'{"agents":{"co2":{"erf":[0,0.5,1.25]}},"startYear":1750}').hexdigest()
    expect(pathwayChecksum(1750, { co2: { erf: [0, 0.5, 1.25] } })).toBe("8ca720ad09c37143cadf101da478da98ad294f63ee947680f1985df8d69dada6");
  });
});
