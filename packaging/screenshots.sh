#!/usr/bin/env bash
# Regenerates every window screenshot in testdata/ui: the program runs under
# Xvfb once per screen size (1280×720, 1366×768, 1920×1080), fills the screen
# and writes each view listed in ui/shots.go as <view>-<width>x<height>.png.
# Then it checks that on a 1366×768 screen a first start opens no larger than
# the screen. Needs Xvfb and xwininfo (x11-utils).
#
#   bash packaging/screenshots.sh            # into testdata/ui
#   bash packaging/screenshots.sh /tmp/shots # elsewhere
set -euo pipefail
cd "$(dirname "$0")/.."
out=${1:-testdata/ui}
display=${UPRIGHT_DISPLAY:-:17}
work=$(mktemp -d)
xpid=""
cleanup() {
	[ -n "$xpid" ] && kill "$xpid" 2>/dev/null || true
	rm -rf "$work"
}
trap cleanup EXIT

go build -o "$work/upright" .

# startx SIZE starts Xvfb with one screen of SIZE (WxH) on $display.
startx() {
	Xvfb "$display" -screen 0 "${1}x24" -nolisten tcp >"$work/xvfb.log" 2>&1 &
	xpid=$!
	for _ in $(seq 50); do
		if ! kill -0 "$xpid" 2>/dev/null; then
			echo "screenshots: Xvfb could not start on $display (in use? set UPRIGHT_DISPLAY)" >&2
			cat "$work/xvfb.log" >&2
			return 1
		fi
		DISPLAY=$display xwininfo -root >/dev/null 2>&1 && return 0
		sleep 0.1
	done
	echo "screenshots: Xvfb did not start on $display" >&2
	return 1
}
stopx() {
	kill "$xpid" 2>/dev/null || true
	wait "$xpid" 2>/dev/null || true
	xpid=""
}

mkdir -p "$out"
for size in 1280x720 1366x768 1920x1080; do
	startx "$size"
	# A fresh home each time: no remembered scheme, size or dividers.
	mkdir -p "$work/home-$size"
	HOME="$work/home-$size" DISPLAY=$display UPRIGHT_SHOTS="$out" timeout 120 "$work/upright"
	stopx
done

# A first start on a 1366×768 screen opens no larger than the screen.
startx 1366x768
mkdir -p "$work/home-first"
HOME="$work/home-first" DISPLAY=$display "$work/upright" >"$work/first.log" 2>&1 &
app=$!
geometry=""
for _ in $(seq 100); do
	geometry=$(DISPLAY=$display xwininfo -root -tree | grep '"Upright —' | grep -o '[0-9]*x[0-9]*+' | head -1 | tr -d +) || true
	[ -n "$geometry" ] && break
	sleep 0.1
done
sleep 2 # the window checks its scale once shown
geometry=$(DISPLAY=$display xwininfo -root -tree | grep '"Upright —' | grep -o '[0-9]*x[0-9]*+' | head -1 | tr -d +) || true
kill "$app" 2>/dev/null || true
wait "$app" 2>/dev/null || true
stopx
if [ -z "$geometry" ]; then
	echo "screenshots: the window did not open on the 1366x768 screen" >&2
	exit 1
fi
w=${geometry%x*} h=${geometry#*x}
if [ "$w" -gt 1366 ] || [ "$h" -gt 768 ]; then
	echo "screenshots: on a 1366x768 screen the window opened at ${w}x${h}" >&2
	exit 1
fi
echo "screenshots: written to $out; on a 1366x768 screen the window opens at ${w}x${h}"
