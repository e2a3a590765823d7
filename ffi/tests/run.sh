#!/usr/bin/env bash
# The C ABI from the languages that call it: C99 (dynamic and static link),
# C++, Fortran, Python ctypes, valgrind memcheck, several threads at once, and
# the plant calls against the Rust core's own numbers.
# Builds and installs the library with ffi/install.sh under a scratch prefix
# and compiles everything through its pkg-config file.
# Prints one line per step and a final "ffi: N passed, M failed"; exits
# non-zero if any step failed.
set -euo pipefail

here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
ffi=$(dirname "$here")
root=$(dirname "$ffi")
cd "$root"

# Tools from Debian's packages: installed when missing and running as root,
# otherwise a clear failure.
need() {
    local tool=$1 package=$2
    command -v "$tool" >/dev/null 2>&1 && return 0
    if [ "$(id -u)" = 0 ]; then
        echo "ffi: installing $package for $tool"
        apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$package" >/dev/null
    else
        echo "ffi: $tool is missing; install it with: sudo apt-get install -y $package" >&2
        exit 1
    fi
}
need gcc gcc
need g++ g++
need gfortran gfortran
need valgrind valgrind
need pkg-config pkgconf
need python3 python3

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

# Built and installed by ffi/install.sh under a scratch prefix, as a C user
# installs it; every C build below takes its flags from the ebullio.pc the
# script writes, and the version from it too.
bash "$ffi/install.sh" "$work/prefix" >/dev/null
lib=$work/prefix/lib
[ -f "$lib/libebullio_c.so" ] && [ -f "$lib/libebullio_c.a" ] || {
    echo "ffi: $lib/libebullio_c.{so,a} not installed" >&2
    exit 1
}
export PKG_CONFIG_PATH=$lib/pkgconfig
version=$(pkg-config --modversion ebullio)
abi=$(sed -n 's/^abi-version *= *\([0-9][0-9]*\).*/\1/p' ffi/Cargo.toml)
read -r -a cflags <<<"$(pkg-config --cflags ebullio)"
read -r -a libs <<<"$(pkg-config --libs ebullio)"
static_libs=()
for word in $(pkg-config --static --libs ebullio); do
    case $word in
        -lebullio_c) static_libs+=("$lib/libebullio_c.a") ;;
        -L*) ;;
        *) static_libs+=("$word") ;;
    esac
done
c99=(-std=c99 -Wall -Wextra -Werror -pedantic)
expect=(-DEXPECTED_VERSION="\"$version\"" -DEXPECTED_ABI="$abi")
rpath=(-Wl,-rpath,"$lib")

c_dynamic() {
    gcc "${c99[@]}" "${cflags[@]}" "${expect[@]}" "$here/c/test_ebullio.c" \
        -o "$work/c_dynamic" "${libs[@]}" "${rpath[@]}" -lm &&
        ldd "$work/c_dynamic" | grep 'libebullio_c\.so' >/dev/null &&
        "$work/c_dynamic"
}

c_static() {
    gcc "${c99[@]}" "${cflags[@]}" "${expect[@]}" "$here/c/test_ebullio.c" \
        -o "$work/c_static" "${static_libs[@]}" &&
        ! ldd "$work/c_static" | grep libebullio_c >/dev/null &&
        "$work/c_static"
}

cxx_header() {
    g++ -std=c++11 -Wall -Wextra -Werror -pedantic "${cflags[@]}" "$here/cpp/test_header.cpp" \
        -o "$work/cxx" "${libs[@]}" "${rpath[@]}" &&
        "$work/cxx"
}

fortran() {
    mkdir -p "$work/fortran" &&
        gfortran -std=f2008 -Wall -Wextra -Werror -J"$work/fortran" \
            "$here/fortran/ebullio_mod.f90" "$here/fortran/test_ebullio.f90" \
            -o "$work/fortran/test" "${libs[@]}" "${rpath[@]}" &&
        "$work/fortran/test"
}

python_ctypes() {
    python3 "$here/python/test_ctypes.py" "$lib/libebullio_c.so" "$version"
}

valgrind_memcheck() {
    gcc -g "${c99[@]}" "${cflags[@]}" "${expect[@]}" "$here/c/test_ebullio.c" \
        -o "$work/c_valgrind" "${libs[@]}" "${rpath[@]}" -lm &&
        valgrind --error-exitcode=1 --leak-check=full --quiet "$work/c_valgrind"
}

# The Rust core's own numbers for the plant steps (ffi/examples/plant_reference.rs),
# without and with the losses and off-design operation.
plant_reference() {
    { [ -f "$work/plant_reference.txt" ] ||
        cargo run --release --quiet -p ebullio-ffi --example plant_reference >"$work/plant_reference.txt"; } &&
        { [ -f "$work/off_design_reference.txt" ] ||
            cargo run --release --quiet -p ebullio-ffi --example plant_reference -- off-design \
                >"$work/off_design_reference.txt"; }
}

plant_c() {
    plant_reference &&
        gcc "${c99[@]}" "${cflags[@]}" "$here/c/test_plant.c" \
            -o "$work/plant_c" "${libs[@]}" "${rpath[@]}" -lm &&
        "$work/plant_c" "$work/plant_reference.txt" "$work/off_design_reference.txt" &&
        valgrind --error-exitcode=1 --leak-check=full --quiet \
            "$work/plant_c" "$work/plant_reference.txt" "$work/off_design_reference.txt"
}

plant_ctypes() {
    plant_reference &&
        python3 "$here/python/test_plant_ctypes.py" "$lib/libebullio_c.so" "$work/plant_reference.txt"
}

# The README's C program, taken from README.md ("Use from C"), compiled by
# the README's command line through pkg-config and run.
readme_c() {
    awk '/^## Use from C/ { section = 1 }
         section && /^```c$/ { copying = 1; next }
         copying && /^```$/ { exit }
         copying { print }' README.md >"$work/app.c" &&
        grep -q 'int main' "$work/app.c" &&
        cc "${c99[@]}" "$work/app.c" $(pkg-config --cflags --libs ebullio) -o "$work/app" &&
        LD_LIBRARY_PATH=$lib "$work/app" >"$work/app.out" &&
        cat "$work/app.out" &&
        grep -Eq '^main steam: h = [0-9]+\.[0-9] kJ/kg, s = [0-9]+\.[0-9]{4} kJ/\(kg K\)$' "$work/app.out" &&
        grep -q '^exhaust: cp is absent' "$work/app.out"
}

threads() {
    gcc "${c99[@]}" -pthread "${cflags[@]}" "$here/c/test_threads.c" \
        -o "$work/threads" "${libs[@]}" "${rpath[@]}" &&
        "$work/threads"
}

passed=0
failed=0
for step in c_dynamic c_static cxx_header fortran python_ctypes valgrind_memcheck threads \
    plant_c plant_ctypes readme_c; do
    if "$step" >"$work/$step.log" 2>&1; then
        passed=$((passed + 1))
        echo "ok   $step: $(tail -n 1 "$work/$step.log")"
    else
        failed=$((failed + 1))
        echo "FAIL $step:"
        sed 's/^/    /' "$work/$step.log"
    fi
done
echo "ffi: $passed passed, $failed failed"
[ "$failed" = 0 ]
