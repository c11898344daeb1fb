#!/usr/bin/env bash
# Runs every Upright test, installing missing prerequisites first, and ends
# with one plain line: "N passed, N failed".
set -euo pipefail
cd "$(dirname "$0")/.."
source packaging/prereqs.sh
export PATH="$PATH:/usr/local/go/bin:$HOME/.local/go/bin"
log=$(mktemp)
trap 'rm -f "$log"' EXIT
go build -o "$log.sum" ./packaging/testsum
status=0
# Every package; then the comparison model under the race detector.
go test -count=1 -json ./... >>"$log" 2>&1 || status=1
go test -count=1 -race -json ./ui/model/ >>"$log" 2>&1 || status=1
# Bounded fuzzing of the parsers (package, target). The bound is a count of
# runs, not a time: a time limit that falls while the fuzzer is shrinking a
# new input ends in "context deadline exceeded", a failure that found nothing.
while read -r pkg target; do
	if [ -d "$pkg" ] && grep -qs "func $target(" "$pkg"/*_test.go; then
		go test -json -run '^$' -fuzz "^${target}\$" -fuzztime 150000x -fuzzminimizetime 2000x "./$pkg" >>"$log" 2>&1 || status=1
	fi
done <<'LIST'
ui/units FuzzParseLength
ui/model FuzzTakedown
ui/schemefile FuzzUnmarshal
LIST
"$log.sum" <"$log" || status=1
rm -f "$log.sum"
exit "$status"
