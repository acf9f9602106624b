#!/bin/sh
# Speed of the Lorenz model over t in [0, 1000] at rtol = atol = 1e-10 with 8th-order methods:
#   Phasewright (model written in the notation, compiled by the runtime, DOP853, warm JVM),
#   GSL rk8pd with a hand-written C right-hand side, and scipy's solve_ivp DOP853.
# Needs: a JDK 21+, a C compiler, libgsl-dev and python3 with scipy (Debian: apt-get install libgsl-dev python3-scipy).
# The three runs are sequential on the same machine; each prints evaluations, steps and wall time.
set -eu
cd "$(dirname "$0")/.."
. scripts/java-home.sh
phasewright_java_home
END=${END:-1000}; RTOL=${RTOL:-1e-10}; ATOL=${ATOL:-1e-10}
mkdir -p bench/target
[ "${SKIP_INSTALL:-}" = 1 ] || ./mvnw -B -q install -pl runtime,language -DskipTests -Dexec.skip >/dev/null
./mvnw -B -q -f bench/pom.xml package >/dev/null
"$JAVA_HOME/bin/java" -cp "bench/target/classes:$(cat bench/target/classpath.txt)" org.phasewright.bench.LorenzBenchmark \
    bench/lorenz.phase "$END" "$RTOL" "$ATOL" 20
if cc -O2 -o bench/target/lorenz_rk8pd bench/native/lorenz_rk8pd.c -lgsl -lgslcblas -lm 2>/dev/null; then
    bench/target/lorenz_rk8pd "$END" "$RTOL" "$ATOL" 20
else
    echo "GSL rk8pd: skipped (no C compiler or libgsl-dev)"
fi
if python3 -c "import scipy" 2>/dev/null; then
    python3 bench/native/lorenz_scipy.py "$END" "$RTOL" "$ATOL" 3
else
    echo "scipy: skipped (python3-scipy not installed)"
fi
