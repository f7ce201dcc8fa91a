#!/usr/bin/env bash
# Coverage-guided fuzzing of the checker and the formatter (Jazzer, the `fuzz` Maven profile), for
# a bounded time: FUZZ_SECONDS (default 120), libFuzzer seed FUZZ_SEED (default 1). Seeds are the
# samples and every spec of the diagnostics corpus, plus the committed compiler/src/fuzz/corpus.
# Exits non-zero on a finding; its input is left in compiler/target/fuzz/finding-*.
set -euo pipefail
cd "$(dirname "$0")/../../.."

seconds="${FUZZ_SECONDS:-120}"
seed="${FUZZ_SEED:-1}"
work=compiler/target/fuzz
rm -rf "$work/seeds" "$work/corpus" "$work"/finding-*
mkdir -p "$work/seeds" "$work/corpus"
# Flattened names keep two 'main.jonq' of different cases apart.
while IFS= read -r -d '' spec; do
  cp "$spec" "$work/seeds/$(tr '/' '_' <<<"$spec")"
done < <(find samples compiler/src/test/resources/diagnostics -name '*.jonq' -print0 | sort -z)

log="$work/fuzz.log"
status=0
mvn -B -q -P fuzz -pl compiler -am process-test-classes \
  -Dfuzz.seconds="$seconds" -Dfuzz.seed="$seed" >"$log" 2>&1 || status=$?
grep -E '^(INFO: (seed|Seed)|#[0-9]+[[:space:]]+(INITED|DONE)|stat::number_of_executed_units|==|Java Exception|  at jonquil|Caused by|.*finding-)' "$log" | head -60 || true
if [ "$status" -ne 0 ]; then
  tail -40 "$log"
  echo "fuzzing found a problem (or could not run): see $log" >&2
  exit "$status"
fi
done_line=$(grep -E '^#[0-9]+[[:space:]]+DONE' "$log" | tail -1)
execs=$(grep -oE 'stat::number_of_executed_units: [0-9]+' "$log" | grep -oE '[0-9]+$' | tail -1)
cov=$(grep -oE 'cov: [0-9]+' <<<"$done_line" | grep -oE '[0-9]+')
ft=$(grep -oE 'ft: [0-9]+' <<<"$done_line" | grep -oE '[0-9]+')
echo "fuzz: ${execs:-?} executions in ${seconds} s (seed $seed), ${cov:-?} covered edges, ${ft:-?} features, no finding"
