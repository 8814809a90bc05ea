#!/bin/sh
# Long events on the wizard's event thread (issue 17; docs/performance.md, "Long events on the
# wizard's event thread"): every event dispatched for longer than 50 ms while the wizard starts,
# designs, and a user clicks every step, every tab of the result step and the File menu's example
# scenarios.
#
#   src/jmh/sh/edt_events.sh [JAR] [RUNS] [JAVA OPTIONS...]
#
# JAR defaults to target/counterpoise.jar (build it with mvn -o -q package -DskipTests), RUNS to 1.
# The harness (src/jmh/java/org/counterpoise/bench/EdtEventTime.java and SlowEventLog.java) is
# compiled against the jar into a temporary folder; each run is a fresh JVM. Without a DISPLAY the
# script runs itself under xvfb-run (1400 x 900). Preferences live in a temporary folder
# (java.util.prefs.userRoot); one unmeasured run first writes them, as for a user who has opened the
# wizard before. Options: -Dedt.bound=MS (default 50), -Dedt.shots=FOLDER (a screenshot after each
# click). Prints each run's long events, and the load average before and after.
set -eu
if [ -z "${DISPLAY:-}" ]; then
    exec xvfb-run -a -s "-screen 0 1400x900x24" sh "$0" "$@"
fi
JAR=${1:-target/counterpoise.jar}
RUNS=${2:-1}
[ $# -ge 1 ] && shift
[ $# -ge 1 ] && shift
WORK=$(mktemp -d)
trap 'rm -rf "$WORK"' EXIT
HERE=$(cd "$(dirname "$0")" && pwd -P)
javac -d "$WORK/classes" -cp "$JAR" "$HERE/../java/org/counterpoise/bench/EdtEventTime.java" \
    "$HERE/../java/org/counterpoise/bench/SlowEventLog.java"
run() {
    java -Djava.util.prefs.userRoot="$WORK/prefs" "$@" -cp "$WORK/classes:$JAR" org.counterpoise.bench.EdtEventTime
}
echo "jar $JAR, $RUNS runs, java options: ${*:-none}"
echo "cores $(nproc), load before: $(cut -d' ' -f1-3 /proc/loadavg)"
java -version 2>&1 | head -1
run "$@" > /dev/null
i=0
while [ "$i" -lt "$RUNS" ]; do
    echo "--- run $((i + 1))"
    run "$@"
    i=$((i + 1))
done
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
