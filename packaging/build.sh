#!/usr/bin/env bash
# Builds Upright's installable packages into packaging/dist/:
#   upright-<version>-linux-<arch>.tar.xz   binary, icon, desktop entry, Makefile
#   upright-<version>-windows-amd64.exe     cross-compiled with mingw-w64, with
#                                           the icon and version embedded
# The version is cli.Version in ui/cli/cli.go; nothing else is stamped.
#
#   bash packaging/build.sh               build both packages
#   bash packaging/build.sh --check       build both, then check them (CI)
#   bash packaging/build.sh --no-windows  skip the Windows build (with or without --check)
set -euo pipefail
cd "$(dirname "$0")/.."
root=$PWD

check=0
windows=1
for arg in "$@"; do
	case "$arg" in
	--check) check=1 ;;
	--no-windows) windows=0 ;;
	-h | --help)
		sed -n '2,10p' "$0" | sed 's/^# \{0,1\}//'
		exit 0
		;;
	*)
		echo "build.sh: unknown option '$arg'; accepted: --check, --no-windows, --help" >&2
		exit 2
		;;
	esac
done

fyne_tool="fyne.io/tools/cmd/fyne@v1.7.4"
app_id="app.upright.columns" # the ID ui/app.go passes to app.NewWithID

source packaging/prereqs.sh
export PATH="$PATH:/usr/local/go/bin:$HOME/.local/go/bin"

# Debian packages this script needs beyond prereqs.sh: the Windows cross
# compiler when building for Windows; make, and desktop-file-utils when it can
# be had, for --check.
have_pkg() { dpkg-query -W -f='${Status}' "$1" 2>/dev/null | grep -q "install ok installed"; }
apt_install() {
	local sudo=""
	[ "$(id -u)" -eq 0 ] || sudo="sudo"
	echo "build.sh: installing $*"
	$sudo env DEBIAN_FRONTEND=noninteractive apt-get update -qq &&
		$sudo env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "$@" >/dev/null
}
need=()
[ "$windows" -eq 0 ] || have_pkg gcc-mingw-w64-x86-64 || need+=(gcc-mingw-w64-x86-64)
[ "$check" -eq 0 ] || have_pkg make || need+=(make)
[ "${#need[@]}" -eq 0 ] || apt_install "${need[@]}"
if [ "$check" -eq 1 ] && ! command -v desktop-file-validate >/dev/null 2>&1; then
	apt_install desktop-file-utils || echo "build.sh: desktop-file-utils could not be installed; the desktop entry will not be validated"
fi

version=$(sed -n 's/^const Version = "\([^"]*\)".*/\1/p' ui/cli/cli.go)
if ! printf '%s' "$version" | grep -Eq '^[0-9]+\.[0-9]+\.[0-9]+([-+][0-9A-Za-z.-]+)?$'; then
	echo "build.sh: could not read a version like 1.2.3 from 'const Version' in ui/cli/cli.go (got '$version')" >&2
	exit 1
fi
arch=$(go env GOARCH)
dist="$root/packaging/dist"
linux_name="upright-$version-linux-$arch"
linux_pkg="$dist/$linux_name.tar.xz"
windows_pkg="$dist/upright-$version-windows-amd64.exe"
mkdir -p "$dist"

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

elapsed() { printf '%dm%02ds' $(($1 / 60)) $(($1 % 60)); }

# ---- Linux: a tar.xz of one folder, installed with make -------------------
t0=$SECONDS
stage="$work/$linux_name"
mkdir -p "$stage"
# Same flags as the test builds, so the compiled packages come from the cache.
go build -buildvcs=false -ldflags "-s -w" -o "$stage/upright" .
install -m 644 packaging/icon/upright.png "$stage/upright.png"
install -m 644 packaging/linux/upright.desktop "$stage/upright.desktop"
install -m 644 packaging/linux/Makefile "$stage/Makefile"
epoch=${SOURCE_DATE_EPOCH:-$(git log -1 --format=%ct 2>/dev/null || date +%s)}
tar -C "$work" --sort=name --owner=0 --group=0 --numeric-owner --mtime="@$epoch" \
	-cf - "$linux_name" | xz -9 -T0 >"$linux_pkg.part"
mv "$linux_pkg.part" "$linux_pkg"
echo "build.sh: built $(basename "$linux_pkg") ($(du -k "$linux_pkg" | cut -f1) KiB) in $(elapsed $((SECONDS - t0)))"

# ---- Windows: cross-compiled .exe with icon, manifest and version info ----
if [ "$windows" -eq 1 ]; then
	t0=$SECONDS
	# The Fyne tool is built for this machine, then writes a resource object
	# (icon, manifest, version) and a metadata file beside main.go and runs
	# go build for Windows. It does so in a copy of the source, so the
	# working tree never holds those files.
	GOBIN="$work/bin" GOOS= GOARCH= go install "$fyne_tool"
	src="$work/win/upright"
	mkdir -p "$src"
	tar -C "$root" --exclude=./.git --exclude=./packaging/dist --exclude=./upright --exclude='*.exe' \
		-cf - . | tar -C "$src" -xf -
	(
		cd "$src"
		# --release: optimised C without debug info, -trimpath, -ldflags "-s -w",
		# Fyne's release build tag; the tool adds -ldflags -H=windowsgui.
		CGO_ENABLED=1 GOOS=windows GOARCH=amd64 CC=x86_64-w64-mingw32-gcc GOFLAGS=-buildvcs=false \
			"$work/bin/fyne" package --os windows --release --src "$src" --name Upright --app-id "$app_id" \
			--app-version "$version" --icon "$root/packaging/icon/upright.png"
	)
	mv "$src/Upright.exe" "$windows_pkg"
	echo "build.sh: built $(basename "$windows_pkg") ($(du -k "$windows_pkg" | cut -f1) KiB) in $(elapsed $((SECONDS - t0)))"
fi

[ "$check" -eq 1 ] || exit 0

# ---- Checks ----------------------------------------------------------------
fail() {
	echo "build.sh --check: $*" >&2
	exit 1
}

# The committed icon is the generator's output, a 512x512 PNG.
go run ./packaging/icon/gen -o "$work/icon.png"
cmp -s "$work/icon.png" packaging/icon/upright.png ||
	fail "packaging/icon/upright.png differs from what packaging/icon/gen draws; rerun: go run ./packaging/icon/gen -o packaging/icon/upright.png"
[ "$(od -An -tx1 -N8 packaging/icon/upright.png | tr -d ' \n')" = 89504e470d0a1a0a ] || fail "upright.png is not a PNG"
[ "$(od -An -tx1 -j16 -N8 packaging/icon/upright.png | tr -d ' \n')" = 0000020000000200 ] || fail "upright.png is not 512x512"

# The archive holds exactly the four files, in one folder.
listing=$(tar -tJf "$linux_pkg" | sort)
expected=$(printf '%s\n' "$linux_name/" "$linux_name/Makefile" "$linux_name/upright" \
	"$linux_name/upright.desktop" "$linux_name/upright.png" | sort)
[ "$listing" = "$expected" ] || fail "$(basename "$linux_pkg") holds:
$listing
expected:
$expected"

# Run in place from the unpacked archive, with no display.
mkdir -p "$work/unpack"
tar -C "$work/unpack" -xJf "$linux_pkg"
bin="$work/unpack/$linux_name/upright"
[ -x "$bin" ] || fail "the unpacked binary is not executable"
got=$(env -u DISPLAY -u WAYLAND_DISPLAY "$bin" --version 2>/dev/null)
[ "$got" = "upright $version" ] || fail "upright --version printed '$got', expected 'upright $version'"
out=$(env -u DISPLAY -u WAYLAND_DISPLAY "$bin" compare --materials steel --length 4m --load 1000kN 2>"$work/compare.err") ||
	fail "upright compare failed: $(cat "$work/compare.err")"
[ -n "$out" ] || fail "upright compare printed nothing"
echo "build.sh --check: the unpacked binary runs: $got; compare printed $(printf '%s\n' "$out" | wc -l) lines"

# Desktop entry, as shipped and as installed.
validate() {
	if command -v desktop-file-validate >/dev/null 2>&1; then
		desktop-file-validate "$1" || fail "desktop-file-validate rejected $1"
	fi
}
validate "$work/unpack/$linux_name/upright.desktop"

# make install and make uninstall to a temporary prefix.
prefix="$work/prefix"
make -s -C "$work/unpack/$linux_name" install PREFIX="$prefix"
for f in bin/upright share/applications/upright.desktop share/icons/hicolor/512x512/apps/upright.png; do
	[ -f "$prefix/$f" ] || fail "make install did not install $f"
done
[ -x "$prefix/bin/upright" ] || fail "the installed binary is not executable"
got=$(env -u DISPLAY -u WAYLAND_DISPLAY "$prefix/bin/upright" --version 2>/dev/null)
[ "$got" = "upright $version" ] || fail "the installed upright --version printed '$got'"
grep -qx "Exec=$prefix/bin/upright" "$prefix/share/applications/upright.desktop" ||
	fail "the installed desktop entry does not run $prefix/bin/upright"
validate "$prefix/share/applications/upright.desktop"
make -s -C "$work/unpack/$linux_name" uninstall PREFIX="$prefix"
left=$(find "$prefix" -type f)
[ -z "$left" ] || fail "make uninstall left: $left"
if command -v desktop-file-validate >/dev/null 2>&1; then
	echo "build.sh --check: make install and uninstall work; desktop-file-validate accepts the entry"
else
	echo "build.sh --check: make install and uninstall work; desktop-file-validate is not installed, entry not validated"
fi

# The .exe is a 64-bit Windows GUI program with a resource section.
if [ "$windows" -eq 1 ]; then
	exe="$windows_pkg"
	le() { od -An -tu"$2" -j"$1" -N"$2" "$exe" | tr -d ' '; } # little-endian on this machine
	[ "$(od -An -c -N2 "$exe" | tr -d ' ')" = MZ ] || fail "$(basename "$exe") does not start with MZ"
	pe=$(le 60 4)
	[ "$(od -An -tx1 -j"$pe" -N4 "$exe" | tr -d ' ')" = 50450000 ] || fail "no PE signature at offset $pe"
	[ "$(le $((pe + 4)) 2)" = $((0x8664)) ] || fail "the .exe is not for x86-64"
	[ "$(le $((pe + 24 + 68)) 2)" = 2 ] || fail "the .exe is not a GUI-subsystem program (-H=windowsgui)"
	# Resource types at the top of .rsrc: 3 icon, 14 icon group, 16 version, 24 manifest.
	if command -v x86_64-w64-mingw32-objdump >/dev/null 2>&1; then
		types=$(x86_64-w64-mingw32-objdump -p "$exe" | sed -n '/The .rsrc Resource Directory section/,$p' |
			sed -n 's/^[0-9a-f]\{3\}   Entry: ID: 0x\([0-9a-f]*\),.*/\1/p' | tr '\n' ' ')
		[ "$types" = "000003 00000e 000010 000018 " ] ||
			fail "the .exe's resources are '$types', expected icon, icon group, version and manifest"
	fi
	desc=""
	command -v file >/dev/null 2>&1 && desc=": $(file -b "$exe")"
	echo "build.sh --check: $(basename "$exe") is an x86-64 Windows GUI executable with icon, version and manifest$desc"
fi
echo "build.sh --check: packages in packaging/dist are good"
