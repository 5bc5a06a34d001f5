#!/usr/bin/env bash
# W1's check value from the engine and from the NumPy reference's model code fed with the
# engine's own sampled inputs (bench-reference/w1_same_inputs.py): no sampling noise between
# them, so they must agree to rounding; a difference means the two compute the model
# differently. Needs python3 with numpy and a built engine (the CLI builds it when stale).
# Usage: scripts/check-same-inputs.sh [MEMBERS=100000] [SEED=w1]
set -euo pipefail
MEMBERS="${1:-100000}"
SEED="${2:-w1}"
HERE="$(cd "$(dirname "$0")/.." && pwd)"
python3 -c "import numpy" 2>/dev/null || { echo "check-same-inputs: python3 needs numpy (Debian: python3-numpy)" >&2; exit 2; }
WORK="$(mktemp -d)"
trap 'rm -rf "$WORK"' EXIT
ENGINE_LINE="$(node "$HERE/bin/plumeline-engine.mjs" bench --members "$MEMBERS" --threads 1 --seed "$SEED")"
# The bench's own spec (src/bench/w1-spec.ts), written out for the member table.
node --input-type=module -e "
import { writeFileSync } from 'node:fs';
const { w1Spec } = await import(process.argv[1]);
writeFileSync(process.argv[2], JSON.stringify(w1Spec(Number(process.argv[3]), process.argv[4])));
" "$HERE/dist/bench/w1-spec.js" "$WORK/spec.json" "$MEMBERS" "$SEED"
node "$HERE/bin/plumeline-engine.mjs" members "$WORK/spec.json" --out "$WORK/members.csv"
REFERENCE_LINE="$(cd "$HERE/bench-reference" && python3 w1_same_inputs.py "$WORK/members.csv")"
echo "$ENGINE_LINE"
echo "$REFERENCE_LINE"
python3 - "$ENGINE_LINE" "$REFERENCE_LINE" <<'PY'
import json, sys
engine, reference = (json.loads(line)["check"] for line in sys.argv[1:3])
print(f"engine − reference with the same inputs: {engine - reference:+.4f} (checks printed to 4 decimals)")
PY
