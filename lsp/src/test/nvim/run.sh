#!/bin/sh
# Runs the headless Neovim probe against lsp/target/jonquil.jar and checks its report.
# Needs Neovim 0.7.2 or later and a built jar (mvn -q -DskipTests package); installs nothing.
set -eu
here=$(cd "$(dirname "$0")" && pwd)
repo=$(cd "$here/../../../.." && pwd)
out="$repo/lsp/target/nvim-probe.json"
command -v nvim >/dev/null 2>&1 || { echo "run.sh: nvim not found" >&2; exit 2; }
[ -f "$repo/lsp/target/jonquil.jar" ] || { echo "run.sh: build lsp/target/jonquil.jar first" >&2; exit 2; }
rm -f "$out"
status=0
JONQUIL_REPO="$repo" JONQUIL_PROBE_OUT="$out" \
  timeout 180 nvim --headless --clean -n -i NONE -c "luafile $here/probe.lua" </dev/null || status=$?
[ -f "$out" ] || { echo "run.sh: the probe wrote no report (nvim exit $status)" >&2; exit 1; }
cat "$out"; echo
grep -Eq '"ok": ?true' "$out" || { echo "run.sh: the probe failed" >&2; exit 1; }
[ "$status" -eq 0 ] || { echo "run.sh: nvim exited with $status" >&2; exit 1; }
grep -Eq '"name": ?"jonquil"' "$out" || { echo "run.sh: no serverInfo" >&2; exit 1; }
echo "run.sh: Neovim probe passed"
