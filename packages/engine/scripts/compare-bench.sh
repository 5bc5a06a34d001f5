#!/usr/bin/env bash
# Times benchmark workload W1 (bench-reference/README.md) for the engine and both reference
# programs of bench-reference/ in the same session, RUNS times each (interleaved, so machine
# load hits all three alike), and prints the median total_s of each, the engine's ratios to the references, and
# the check values, plus each program's median stage timings. The engine runs twice per
# round: W1's own outputs (plumeline-ts) and with the product's full per-year summaries
# (plumeline-ts-full: forcing and imbalance too), both as a long-lived server runs them (helper
# threads ready, one untimed W1 run before in the same process), and W1 once more as a fresh
# process's first run (plumeline-ts-cold). Extra engine options (e.g. --threads 1)
# can be given in ENGINE_ARGS. The references run with the engine's conventions where they
# differ from W1's definition (REFERENCE_ARGS, default below; "" for W1 as defined), so the
# check values are comparable. The load average is printed before and after.
# Needs gcc and python3 with numpy. Usage: scripts/compare-bench.sh [MEMBERS=100000] [RUNS=3]
set -euo pipefail
MEMBERS="${1:-100000}"
RUNS="${2:-3}"
HERE="$(cd "$(dirname "$0")/.." && pwd)"
SCRIPT=compare-bench
# shellcheck source=reference-programs.sh
source "$HERE/scripts/reference-programs.sh"
echo "reference options: ${REFERENCE_ARGS:-(W1 as defined)}"
node "$HERE/bin/plumeline-engine.mjs" bench --members 1000 >/dev/null # builds dist if needed, warms caches
OUT="$(mktemp)"
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
for _ in $(seq "$RUNS"); do
  # shellcheck disable=SC2086 # ENGINE_ARGS is a list of words
  node "$HERE/bin/plumeline-engine.mjs" bench --members "$MEMBERS" ${ENGINE_ARGS:-} >>"$OUT"
  # shellcheck disable=SC2086
  node "$HERE/bin/plumeline-engine.mjs" bench --members "$MEMBERS" --full ${ENGINE_ARGS:-} >>"$OUT"
  # shellcheck disable=SC2086
  node "$HERE/bin/plumeline-engine.mjs" bench --members "$MEMBERS" --cold ${ENGINE_ARGS:-} >>"$OUT"
  # shellcheck disable=SC2086 # REFERENCE_ARGS is a list of words
  "$C_BIN" "$MEMBERS" $REFERENCE_ARGS >>"$OUT"
  # shellcheck disable=SC2086
  python3 "$BENCH_DIR/w1_reference.py" "$MEMBERS" $REFERENCE_ARGS >>"$OUT"
done
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
python3 - "$OUT" <<'PY'
import json, statistics, sys
rows = [json.loads(line) for line in open(sys.argv[1]) if line.strip()]
by = {}
for r in rows:
    by.setdefault(r["impl"], []).append(r)
med = {k: statistics.median(r["total_s"] for r in v) for k, v in by.items()}
for k, v in by.items():
    print(f"{k:14s} median total_s {med[k]:.4f}  runs {[r['total_s'] for r in v]}  check {v[0]['check']:.4f}")
    stages = "  ".join(f"{s} {statistics.median(r[s] for r in v):.4f}" for s in ("sample_s", "simulate_s", "summarize_s"))
    print(f"{'':14s} median stages: {stages}")
for impl in ("plumeline-ts", "plumeline-ts-full", "plumeline-ts-cold"):
    ts = med.get(impl)
    if not ts: continue
    if "c-scalar" in med: print(f"{impl} / c-scalar = {ts / med['c-scalar']:.3f}")
    if "numpy" in med: print(f"{impl} / numpy    = {ts / med['numpy']:.3f}")
print("targets against C: default threads ≤ 0.35, one thread ≤ 0.5, full summaries (default threads) ≤ 0.6")
PY
