# Sourced by ./phasewright and .ci/run: point JAVA_HOME at a JDK 21 or newer when the default java is older.
java_major() {
  "$1" -version 2>&1 | awk -F'"' '/version/ {split($2, v, "."); print (v[1] == "1" ? v[2] : v[1]); exit}'
}
phasewright_java_home() {
  if [ -n "${JAVA_HOME:-}" ] && [ -x "$JAVA_HOME/bin/java" ] && [ "$(java_major "$JAVA_HOME/bin/java")" -ge 21 ]; then
    return 0
  fi
  if command -v java >/dev/null 2>&1 && [ "$(java_major java)" -ge 21 ]; then
    JAVA_HOME="$(dirname "$(dirname "$(readlink -f "$(command -v java)")")")"
    export JAVA_HOME
    return 0
  fi
  for candidate in /usr/lib/jvm/* /opt/java/* /Library/Java/JavaVirtualMachines/*/Contents/Home; do
    if [ -x "$candidate/bin/javac" ] && [ "$(java_major "$candidate/bin/java")" -ge 21 ]; then
      export JAVA_HOME="$candidate"
      return 0
    fi
  done
  echo "phasewright: needs a JDK 21 or newer; set JAVA_HOME to one." >&2
  return 1
}
