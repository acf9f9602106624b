#!/usr/bin/env bash
# `./phasewright ide [--workspace DIR]`: builds the Phasewright IDE on first use (and after source changes), puts the
# bundled examples into the workspace as a project on first start, and opens the workbench.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
. "$here/scripts/java-home.sh"
phasewright_java_home

workspace="${PHASEWRIGHT_WORKSPACE:-$HOME/phasewright-workspace}"
while [ $# -gt 0 ]; do
  case "$1" in
    --workspace) [ $# -ge 2 ] || { echo "phasewright ide: --workspace needs a folder" >&2; exit 2; }
                 workspace="$2"; shift 2 ;;
    -h|--help)   echo "usage: ./phasewright ide [--workspace DIR]   (default DIR: ~/phasewright-workspace)"; exit 0 ;;
    *)           echo "phasewright ide: unknown option '$1'; try --help" >&2; exit 2 ;;
  esac
done

ide="$here/product/target/phasewright-ide"
marker="$ide/configuration/config.ini"
stale=""
if [ -f "$marker" ]; then
  stale="$(find "$here/runtime/src/main" "$here/language/src/main/java" "$here/language.ide/src/main/java" \
    "$here/language.ui/src/main" "$here/product/src/main" -newer "$marker" -type f 2>/dev/null | head -n 1)"
  [ -z "$stale" ] && stale="$(find "$here" -maxdepth 2 -name pom.xml -newer "$marker" 2>/dev/null | head -n 1)"
fi
if [ ! -f "$marker" ] || [ -n "$stale" ]; then
  echo "phasewright: building the IDE (first use downloads the Eclipse platform and takes a few minutes)..." >&2
  if ! (cd "$here" && ./mvnw -B -q -DskipTests -pl product -am package >"$here/.phasewright-ide-build.log" 2>&1); then
    echo "phasewright: IDE build failed; see $here/.phasewright-ide-build.log" >&2
    exit 2
  fi
fi

if [ -z "${DISPLAY:-}" ] && [ -z "${WAYLAND_DISPLAY:-}" ]; then
  echo "phasewright ide: no display (DISPLAY is not set); on a headless machine: xvfb-run ./phasewright ide" >&2
  exit 2
fi

# First start: the examples become the project "examples" (the IDE imports projects it finds in the workspace folder).
if [ ! -e "$workspace/examples" ]; then
  mkdir -p "$workspace/examples"
  cp "$here"/examples/*.phase "$workspace/examples/"
  cp "$ide/examples.project" "$workspace/examples/.project"
fi

launcher="$(ls "$ide"/plugins/org.eclipse.equinox.launcher_*.jar | head -n 1)"
cd "$ide"
# C1 only: about 40% less CPU to start on small machines; models still run in a few tens of milliseconds.
exec "$JAVA_HOME/bin/java" -XX:TieredStopAtLevel=1 -Dguice_bytecode_gen_option=DISABLED ${PHASEWRIGHT_IDE_VMARGS:-} \
  -jar "$launcher" -data "$workspace" -consoleLog
