#!/usr/bin/env bash
# Installs what Upright needs to build, test and run on Debian or Ubuntu,
# skipping whatever is already present. Safe to run again.
set -euo pipefail

want_go="1.26"
need=()
have() { dpkg-query -W -f='${Status}' "$1" 2>/dev/null | grep -q "install ok installed"; }
for p in ca-certificates curl gcc pkg-config libgl1-mesa-dev xorg-dev xvfb poppler-utils xz-utils python3-ezdxf; do
	have "$p" || need+=("$p")
done
if [ "${#need[@]}" -gt 0 ]; then
	echo "prereqs: installing ${need[*]}"
	sudo=""
	[ "$(id -u)" -eq 0 ] || sudo="sudo"
	$sudo env DEBIAN_FRONTEND=noninteractive apt-get update -qq
	$sudo env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
fi

# Go: use the one on PATH or in /usr/local/go when new enough, else fetch it.
export PATH="$PATH:/usr/local/go/bin:$HOME/go/bin"
go_ok() {
	command -v go >/dev/null 2>&1 || return 1
	v=$(go env GOVERSION 2>/dev/null | sed 's/^go//')
	[ "$(printf '%s\n%s\n' "$want_go" "$v" | sort -V | head -n1)" = "$want_go" ]
}
if ! go_ok; then
	echo "prereqs: installing Go $want_go into \$HOME/.local/go"
	arch=$(dpkg --print-architecture)
	mkdir -p "$HOME/.local"
	curl -fsSL "https://go.dev/dl/go${want_go}.0.linux-${arch}.tar.gz" | tar -C "$HOME/.local" -xz
	export PATH="$HOME/.local/go/bin:$PATH"
fi
go version
