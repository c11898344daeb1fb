#!/usr/bin/env bash
# Opens Upright on its demo scheme (the first start; later starts reopen the
# last scheme), installing missing prerequisites first.
set -euo pipefail
cd "$(dirname "$0")/.."
source packaging/prereqs.sh
export PATH="$PATH:/usr/local/go/bin:$HOME/.local/go/bin"
go build -o upright .
exec ./upright "$@"
