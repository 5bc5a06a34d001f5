#!/usr/bin/env bash
# How much benchmark W1's check value (bench-reference/README.md) varies with the random
# stream: runs the engine, the C reference and the NumPy reference with SEEDS different seeds
# each and prints, per program, the mean check ± its standard error and the standard deviation
# between seeds, then the differences of the means with their standard errors. The programs
# draw from different generators, so single runs differ by sampling noise; their means should
# agree within a few standard errors. The references follow the engine's conventions
# (REFERENCE_ARGS, as in compare-bench.sh). Needs gcc and python3 with numpy.
# Usage: scripts/check-spread.sh [SEEDS=10] [MEMBERS=100000]
set -euo pipefail
SEEDS="${1:-10}"
MEMBERS="${2:-100000}"
HERE="$(cd "$(dirname "$0")/.." && pwd)"
SCRIPT=check-spread
# shellcheck source=reference-programs.sh
source "$HERE/scripts/reference-programs.sh"
OUT="$(mktemp)"
echo "reference options: ${REFERENCE_ARGS:-(W1 as defined)}; $SEEDS seeds of $MEMBERS members"
for s in $(seq "$SEEDS"); do
  # The engine's seeds are strings ("w1" is the bench's default), the references' numbers.
  node "$HERE/bin/plumeline-engine.mjs" bench --members "$MEMBERS" --threads 1 --seed "w1-$s" >>"$OUT"
  # shellcheck disable=SC2086 # REFERENCE_ARGS is a list of words
  "$C_BIN" "$MEMBERS" $REFERENCE_ARGS --seed "$s" >>"$OUT"
  # shellcheck disable=SC2086
  python3 "$BENCH_DIR/w1_reference.py" "$MEMBERS" $REFERENCE_ARGS --seed "$s" >>"$OUT"
done
python3 - "$OUT" <<'PY'
import json, math, statistics, sys
checks = {}
for line in open(sys.argv[1]):
    if line.strip():
        row = json.loads(line)
        checks.setdefault(row["impl"], []).append(row["check"])
summary = {}
for impl, values in checks.items():
    sd = statistics.stdev(values) if len(values) > 1 else float("nan")
    summary[impl] = (statistics.mean(values), sd / math.sqrt(len(values)))
    print(f"{impl:14s} check mean {summary[impl][0]:.3f} ± {summary[impl][1]:.3f} (se), sd between seeds {sd:.3f}, runs {values}")
names = list(summary)
for i, a in enumerate(names):
    for b in names[i + 1:]:
        diff = summary[a][0] - summary[b][0]
        se = math.hypot(summary[a][1], summary[b][1])
        print(f"{a} − {b}: {diff:+.3f} ± {se:.3f} (se)")
PY
