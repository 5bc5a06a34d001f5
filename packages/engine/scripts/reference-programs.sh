# Sourced by compare-bench.sh and check-spread.sh: checks the tools the reference programs of
# bench-reference/ need (gcc; python3 with numpy), compiles the C reference into C_BIN, and
# sets REFERENCE_ARGS (the engine's conventions where they differ from W1's definition; ""
# for W1 as defined). Expects HERE (the engine package) and SCRIPT (the caller's name, for
# messages); honours BENCH_DIR.
BENCH_DIR="${BENCH_DIR:-$HERE/bench-reference}"
REFERENCE_ARGS="${REFERENCE_ARGS-"--feedback co2-scaled --temperature annual-mean"}"
for tool in gcc python3; do
  command -v "$tool" >/dev/null || { echo "$SCRIPT: $tool is needed for the reference programs" >&2; exit 2; }
done
python3 -c "import numpy" 2>/dev/null || { echo "$SCRIPT: python3 needs numpy (Debian: python3-numpy)" >&2; exit 2; }
C_BIN="$(mktemp -d)/w1-reference"
gcc -O3 -march=native -o "$C_BIN" "$BENCH_DIR/w1-reference.c" -lm
