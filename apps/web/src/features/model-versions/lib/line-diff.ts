import { diffLines } from "diff";

export type LineDiffEntry =
  | { kind: "added" | "removed" | "same"; text: string }
  /** A run of unchanged lines folded away so the changed lines stand out. */
  | { kind: "folded"; count: number };

function splitLines(value: string): string[] {
  const lines = value.split("\n");
  // A change object's value ends with the newline of its last line: no empty line after it.
  if (lines.at(-1) === "") lines.pop();
  return lines;
}

/**
 * Line-level difference of two texts (the `diff` package's diffLines, Myers' O(ND)
 * algorithm), with unchanged runs folded down to `context` lines either side of a change.
 * Example: lineDiff("a\nb\nc\nd", "a\nb\nc\nd\ne", 1) gives
 * [folded 3, same "d", added "e"].
 */
export function lineDiff(before: string, after: string, context = 1): LineDiffEntry[] {
  const flat: Array<{ kind: "added" | "removed" | "same"; text: string }> = [];
  // Appending a line turns the old last line "x" into "x\n"; end both texts with a newline
  // so that line counts as unchanged rather than removed and added again.
  const withFinalNewline = (text: string) => (text === "" || text.endsWith("\n") ? text : `${text}\n`);
  for (const change of diffLines(withFinalNewline(before), withFinalNewline(after))) {
    const kind = change.added ? "added" : change.removed ? "removed" : "same";
    for (const text of splitLines(change.value)) flat.push({ kind, text });
  }
  const nearChange = flat.map((_, i) =>
    flat.slice(Math.max(0, i - context), i + context + 1).some((entry) => entry.kind !== "same"),
  );
  const out: LineDiffEntry[] = [];
  flat.forEach((entry, i) => {
    if (entry.kind !== "same" || nearChange[i]) {
      out.push(entry);
      return;
    }
    const last = out.at(-1);
    if (last?.kind === "folded") last.count += 1;
    else out.push({ kind: "folded", count: 1 });
  });
  return out;
}
