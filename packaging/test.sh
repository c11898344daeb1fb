#!/usr/bin/env bash
# Runs every Upright test, installing missing prerequisites first.
set -euo pipefail
cd "$(dirname "$0")/.."
source packaging/prereqs.sh
export PATH="$PATH:/usr/local/go/bin:$HOME/.local/go/bin"
go test -count=1 ./...
# The comparison model under the race detector.
go test -count=1 -race ./ui/model/
# Bounded fuzzing of the parsers (package, target).
while read -r pkg target; do
	if [ -d "$pkg" ] && grep -qs "func $target(" "$pkg"/*_test.go; then
		go test -run '^$' -fuzz "^${target}\$" -fuzztime 15s -fuzzminimizetime 2s "./$pkg"
	fi
done <<'LIST'
ui/units FuzzParseLength
ui/model FuzzTakedown
ui/schemefile FuzzUnmarshal
LIST
