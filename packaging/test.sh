#!/usr/bin/env bash
# Runs every Upright test, installing missing prerequisites first.
set -euo pipefail
cd "$(dirname "$0")/.."
source packaging/prereqs.sh
export PATH="$PATH:/usr/local/go/bin:$HOME/.local/go/bin"
go test -count=1 ./...
# The comparison model under the race detector.
go test -count=1 -race ./ui/model/
# Bounded fuzzing of the parsers.
for target in $(go test -list 'Fuzz.*' ./ui/... 2>/dev/null | grep '^Fuzz' || true); do
	pkg=$(grep -rl "func $target(" --include='*_test.go' ui | head -n1 | xargs dirname)
	go test -run '^$' -fuzz "^${target}\$" -fuzztime 20s "./$pkg"
done
