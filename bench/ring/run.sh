#!/bin/sh
# The Lorenz (1996) ring of N forced cells over t in [0, END] with a Dormand–Prince 5(4) method, one after the other
# on the same machine: Phasewright (family compiled to a loop, DP54 "explicit"; cold and warm JVM) and scipy's
# solve_ivp RK45 with a vectorised numpy right-hand side. Prints steps, evaluations, wall times, the ratio of the
# warm medians and the largest difference of the final states.
# Needs: a JDK 21+ and Debian's python3-scipy (apt-get install python3-scipy; run with /usr/bin/python3).
# Defaults: N = 100000, END = 2, RTOL = ATOL = 1e-6 (scipy's default atol), 5 repeats each; the model is
# bench/ring/ring.phase (MODEL=assembler builds the same ring in Java). PIPELINE_N=1000000 also runs a study of that
# size through the pipeline (assemble or lower, compile, simulate, write results) with -Xmx2g and prints its peak heap.
set -eu
cd "$(dirname "$0")/../.."
. scripts/java-home.sh
phasewright_java_home
N=${N:-100000}; END=${END:-2}; RTOL=${RTOL:-1e-6}; ATOL=${ATOL:-1e-6}; REPEATS=${REPEATS:-5}
PYTHON=${PYTHON:-/usr/bin/python3}; MODEL=${MODEL:-bench/ring/ring.phase}
mkdir -p bench/target
[ "${SKIP_INSTALL:-}" = 1 ] || ./mvnw -B -q install -pl runtime,language -DskipTests -Dexec.skip >/dev/null
./mvnw -B -q -f bench/pom.xml package >/dev/null
out=bench/target/ring-final-phasewright.f64
java_line=$("$JAVA_HOME/bin/java" ${JAVA_OPTS:-} -cp "bench/target/classes:$(cat bench/target/classpath.txt)" \
    org.phasewright.bench.RingBenchmark "$MODEL" "$N" "$END" "$RTOL" "$ATOL" "$REPEATS" "$out" 2>/dev/null)
echo "$java_line" | grep -v -- '-warm-median\|-cold '
ours=$(echo "$java_line" | sed -n 's/^phasewright-warm-median //p')
cold=$(echo "$java_line" | sed -n 's/^phasewright-cold //p')
py_line=$("$PYTHON" bench/ring/ring_scipy.py "$N" "$END" "$RTOL" "$ATOL" "$REPEATS" "$out")
echo "$py_line" | grep -v -- '-median '
theirs=$(echo "$py_line" | sed -n 's/^scipy-median //p')
"$PYTHON" -c "print('scipy median / phasewright median: warm %.1fx, cold %.1fx' % ($theirs / $ours, $theirs / $cold))"
if [ -n "${PIPELINE_N:-}" ]; then
    "$JAVA_HOME/bin/java" -Xmx2g -XX:+UseSerialGC -cp "bench/target/classes:$(cat bench/target/classpath.txt)" \
        org.phasewright.bench.RingPipeline "$MODEL" "$PIPELINE_N" "$END" "$RTOL" bench/target/ring-pipeline 2>/dev/null
fi
