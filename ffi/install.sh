#!/usr/bin/env bash
# Builds the C ABI and installs it for C callers under a prefix:
#   PREFIX/lib/libebullio_c.so, PREFIX/lib/libebullio_c.a,
#   PREFIX/include/ebullio.h, PREFIX/lib/pkgconfig/ebullio.pc
# with the .pc file's prefix, libdir and includedir the real, absolute
# paths, so that `pkg-config --cflags --libs ebullio` works as soon as
# PREFIX/lib/pkgconfig is on PKG_CONFIG_PATH (it already is for /usr/local).
#
# Usage: bash ffi/install.sh [PREFIX]     (default /usr/local)
# Builds with `cargo build --release -p ebullio-ffi` into $CARGO_TARGET_DIR
# (default target/). Prints the .pc file's path on success.
set -euo pipefail

here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
root=$(dirname "$here")
prefix=${1:-/usr/local}
mkdir -p "$prefix"
prefix=$(cd "$prefix" && pwd)

cd "$root"
cargo build --release -p ebullio-ffi --quiet
target=${CARGO_TARGET_DIR:-target}
case $target in /*) ;; *) target=$root/$target ;; esac
built=$target/release

# The workspace version, the first `version = "..."` of the top Cargo.toml
# (its [workspace.package] table), which the library also reports.
version=$(sed -n 's/^version *= *"\(.*\)"/\1/p' Cargo.toml | head -n 1)
[ -n "$version" ] || {
    echo "install: no version in Cargo.toml" >&2
    exit 1
}

libdir=$prefix/lib
includedir=$prefix/include
mkdir -p "$libdir/pkgconfig" "$includedir"
install -m 0755 "$built/libebullio_c.so" "$libdir/"
install -m 0644 "$built/libebullio_c.a" "$libdir/"
install -m 0644 "$here/include/ebullio.h" "$includedir/"
sed -e "s|@PREFIX@|$prefix|" -e "s|@LIBDIR@|$libdir|" -e "s|@INCLUDEDIR@|$includedir|" \
    -e "s|@VERSION@|$version|" "$here/ebullio.pc.in" >"$libdir/pkgconfig/ebullio.pc"
echo "$libdir/pkgconfig/ebullio.pc"
