#!/bin/sh
# Runs the headless Neovim probes against lsp/target/jonquil.jar and checks their report: one line per probe,
# failing if any probe failed or is missing. Needs Neovim 0.7.2 or later and a built jar
# (mvn -q -DskipTests package); installs nothing. Neovim's LSP log goes to lsp/target/nvim-cache/nvim/lsp.log.
set -eu
here=$(cd "$(dirname "$0")" && pwd)
repo=$(cd "$here/../../../.." && pwd)
out="$repo/lsp/target/nvim-probe.json"
cache="$repo/lsp/target/nvim-cache"
command -v nvim >/dev/null 2>&1 || { echo "run.sh: nvim not found" >&2; exit 2; }
[ -f "$repo/lsp/target/jonquil.jar" ] || { echo "run.sh: build lsp/target/jonquil.jar first" >&2; exit 2; }
rm -rf "$out" "$cache" "$repo/lsp/target/nvim-server-stdout.bin"
status=0
# XDG_CACHE_HOME moves Neovim's LSP log (stdpath('cache')/lsp.log) into lsp/target, fresh for this run.
XDG_CACHE_HOME="$cache" JONQUIL_REPO="$repo" JONQUIL_PROBE_OUT="$out" \
  timeout 60 nvim --headless --clean -n -i NONE -c "luafile $here/probe.lua" </dev/null || status=$?
[ -f "$out" ] || { echo "run.sh: the probe wrote no report (nvim exit $status)" >&2; exit 1; }
verdict=0
JONQUIL_PROBE_OUT="$out" nvim --headless --clean -n -i NONE -c "luafile $here/check_report.lua" </dev/null || verdict=$?
[ "$verdict" -eq 0 ] || { cat "$out"; echo; echo "run.sh: the probe failed (report above)" >&2; exit 1; }
[ "$status" -eq 0 ] || { echo "run.sh: nvim exited with $status" >&2; exit 1; }
echo "run.sh: Neovim probe passed (report: lsp/target/nvim-probe.json)"
