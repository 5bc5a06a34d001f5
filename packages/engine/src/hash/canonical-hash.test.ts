import { describe, expect, it } from "vitest";
import { canonicalHash } from "./sha256-hex.js";

// Expected digests: Python's hashlib.sha256 of the canonical text written out by hand (keys in
// code-unit order, no whitespace, numbers printed the ECMAScript way, as RFC 8785 Section 3.2
// prescribes), so the check stands outside both the canonicalize package and our own code.
describe("canonicalHash (RFC 8785 JSON Canonicalization Scheme, then SHA-256)", () => {
  it("sorts keys and drops whitespace: { b: 1, a: [2] } hashes '{\"a\":[2],\"b\":1}'", () => {
    expect(canonicalHash({ b: 1, a: [2] })).toBe("63c9663de90ee828bbda6cd9acf02d0c653986c1ec25aa239920641edc9a1de5");
  });

  it("prints numbers as ECMAScript does (1e-7, 1e+21), not as written", () => {
    // '{"m":[1e+21,-0.5],"n":1e-7}'
    expect(canonicalHash({ n: 0.0000001, m: [1_000_000_000_000_000_000_000, -0.5] })).toBe(
      "4a24d7a8a1421082a799a6368abfea21d05c496e1042f9cd418050ebd62c2bde",
    );
  });

  it("gives the same digest whatever order the keys were written in", () => {
    expect(canonicalHash({ a: [2], b: 1 })).toBe(canonicalHash({ b: 1, a: [2] }));
  });

  it("refuses a value JSON cannot hold", () => {
    expect(() => canonicalHash(undefined)).toThrow(RangeError);
  });
});
