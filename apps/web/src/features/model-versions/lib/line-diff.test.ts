import { describe, expect, it } from "vitest";
import { lineDiff } from "./line-diff";

// Expected lines follow from the definition of a line diff (the shortest edit script of
// Myers 1986, which the `diff` package implements): one appended line is one insertion.
describe("lineDiff", () => {
  it("shows one appended line with one line of context and folds the rest", () => {
    expect(lineDiff("a\nb\nc\nd", "a\nb\nc\nd\ne")).toEqual([
      { kind: "folded", count: 3 },
      { kind: "same", text: "d" },
      { kind: "added", text: "e" },
    ]);
  });

  it("shows a replaced middle line as removed then added, with context either side", () => {
    expect(lineDiff("a\nb\nc\nd\ne", "a\nb\nX\nd\ne")).toEqual([
      { kind: "folded", count: 1 },
      { kind: "same", text: "b" },
      { kind: "removed", text: "c" },
      { kind: "added", text: "X" },
      { kind: "same", text: "d" },
      { kind: "folded", count: 1 },
    ]);
  });

  it("gives no changed line for equal texts", () => {
    expect(lineDiff("a\nb", "a\nb")).toEqual([{ kind: "folded", count: 2 }]);
  });

  it("treats a missing text as empty", () => {
    expect(lineDiff("", "only\nnew")).toEqual([
      { kind: "added", text: "only" },
      { kind: "added", text: "new" },
    ]);
  });
});
