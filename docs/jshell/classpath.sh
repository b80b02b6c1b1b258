#!/usr/bin/env bash
# Prints the class path of the strainmath modules and their runtime dependencies, for
#   jshell --class-path "$(docs/jshell/classpath.sh)" --startup DEFAULT --startup docs/jshell/strainmath.jsh
# run from the repository's top folder. Builds and installs the library modules first (quietly).
set -euo pipefail
top="$(cd "$(dirname "$0")/../.." && pwd)"
cd "$top"
mvn -B -q -DskipTests -pl calibration -am install >&2
list="$(mktemp)"
trap 'rm -f "$list"' EXIT
mvn -B -q -pl calibration dependency:build-classpath -DincludeScope=runtime \
    -Dmdep.outputFile="$list" >&2
printf '%s:%s\n' "$top/calibration/target/classes" "$(cat "$list")"
