#!/usr/bin/env bash
# Fresh-machine proof (issue 6): clone the repository into a new folder, run the README's two
# commands as written, and report how long each took.
#   1. `corepack enable && pnpm install && pnpm start` in the background; wait for
#      /api/health, sign in through the API with a demo user, read /api/me, stop the server.
#   2. `pnpm test` (unit, integration and end-to-end).
# Usage: scripts/fresh-clone-check.sh [repository (default: this checkout)] [port (default: 4000)]
set -euo pipefail

repo="${1:-$(git -C "$(dirname "$0")" rev-parse --show-toplevel)}"
port="${2:-4000}"
work="$(mktemp -d -t plumeline-fresh-XXXXXX)"
clone="$work/plumeline"
log="$work/start.log"
base="http://localhost:$port"
server_pid=""

stop_server() {
  if [ -n "$server_pid" ] && kill -0 "$server_pid" 2>/dev/null; then
    # The start command runs in its own process group (setsid): stop the whole group, only it.
    kill -TERM -- "-$server_pid" 2>/dev/null || true
    for _ in $(seq 20); do kill -0 "$server_pid" 2>/dev/null || break; sleep 0.5; done
    kill -KILL -- "-$server_pid" 2>/dev/null || true
  fi
  server_pid=""
}
trap stop_server EXIT

now() { date +%s; }
say() { printf '[fresh-clone] %s\n' "$*"; }

if curl -fsS "$base/api/health" >/dev/null 2>&1; then
  say "something already answers on $base; pass another port as the second argument"; exit 1
fi

say "cloning $repo into $clone"
git clone -q "$repo" "$clone"
cd "$clone"
say "commit $(git rev-parse --short HEAD)"

# The README's first command, exactly as written there (the first ```sh block, first line,
# comment removed), so this script fails when the README and the product drift apart.
readme="README.md"
if [ ! -f "$readme" ]; then
  # Happens while README.md is not committed yet: read the commands from the source tree's copy.
  say "WARNING: README.md is not in the clone (not committed?); reading the commands from $repo/README.md"
  readme="$repo/README.md"
fi
start_cmd="$(awk '/^```sh/{f=1;next} /^```/{if(f)exit} f' "$readme" | sed -n 1p | sed 's/ *#.*$//')"
test_cmd="$(awk '/^```sh/{f=1;next} /^```/{if(f)exit} f' "$readme" | sed -n 2p | sed 's/ *#.*$//')"
say "start command: $start_cmd"
say "test command:  $test_cmd"
[ -n "$start_cmd" ] && [ -n "$test_cmd" ] || { say "could not read the two commands from README.md"; exit 1; }

t0=$(now)
PORT="$port" setsid bash -c "$start_cmd" >"$log" 2>&1 &
server_pid=$!
until curl -fsS "$base/api/health" >/dev/null 2>&1; do
  if ! kill -0 "$server_pid" 2>/dev/null; then say "start command exited early:"; tail -40 "$log"; exit 1; fi
  if [ $(( $(now) - t0 )) -gt 900 ]; then say "no answer on $base/api/health after 15 minutes"; tail -40 "$log"; exit 1; fi
  sleep 2
done
t_up=$(( $(now) - t0 ))
say "health: $(curl -fsS "$base/api/health")"

# Sign in as the demo analyst the start command printed, then ask who we are.
jar="$work/cookies"
email="analyst@harbourline.example"
password="$(grep -Eo "analyst +$email +[^ ]+" "$log" | awk '{print $3}' | head -1)"
[ -n "$password" ] || { say "start output does not list the demo analyst's sign-in"; tail -40 "$log"; exit 1; }
curl -fsS -c "$jar" -H "Origin: $base" -H 'content-type: application/json' \
  -d "{\"email\":\"$email\",\"password\":\"$password\"}" "$base/api/auth/sign-in/email" >/dev/null
me="$(curl -fsS -b "$jar" "$base/api/me")"
echo "$me" | grep -q '"role":"analyst"' || { say "sign-in did not give an analyst session: $me"; exit 1; }
say "signed in as $email: $(echo "$me" | grep -Eo '"permissions":\[[^]]*\]' | tr ',' '\n' | wc -l) permissions"
stop_server
! curl -fsS "$base/api/health" >/dev/null 2>&1 || { say "server still answering after stop"; exit 1; }

t1=$(now)
bash -c "$test_cmd"
t_test=$(( $(now) - t1 ))

say "install + build + start until healthy: ${t_up}s"
say "test command (unit + integration + e2e): ${t_test}s"
say "clone kept at $clone (delete it when done)"
