#!/bin/sh
# The wizard's first window: seconds from the JVM process's start until the wizard's frame is
# showing and the event queue has run once (docs/performance.md, "The wizard's first window").
#
#   src/jmh/sh/first_window.sh [JAR] [RUNS] [JAVA OPTIONS...]
#
# JAR defaults to target/counterpoise.jar (build it with mvn -o -q package -DskipTests), RUNS to 5.
# The harness src/jmh/java/org/counterpoise/bench/FirstWindowTime.java is compiled against the jar
# into a temporary folder; each run is a fresh JVM (java OPTIONS -cp harness:JAR FirstWindowTime),
# as the jar's own main starts the wizard. Without a DISPLAY the script runs itself under
# xvfb-run (one X server for all runs). The preferences (window placement, recent files) live in a
# temporary folder (java.util.prefs.userRoot), so a user's own are neither read nor changed; one
# run before the measured ones writes them, as a user who has opened the wizard before has them,
# and brings the jar into the file cache. Prints every run, the median, and the load average
# before and after: on a shared machine the figure follows the load.
# A class-loading timeline of one run: pass -Xlog:class+load:file=cl.txt:uptime as an option.
set -eu
if [ -z "${DISPLAY:-}" ]; then
    exec xvfb-run -a -s "-screen 0 1400x900x24" sh "$0" "$@"
fi
JAR=${1:-target/counterpoise.jar}
RUNS=${2:-5}
[ $# -ge 1 ] && shift
[ $# -ge 1 ] && shift
WORK=$(mktemp -d)
trap 'rm -rf "$WORK"' EXIT
HERE=$(cd "$(dirname "$0")" && pwd -P)
javac -d "$WORK/classes" -cp "$JAR" "$HERE/../java/org/counterpoise/bench/FirstWindowTime.java"
run() {
    java -Djava.util.prefs.userRoot="$WORK/prefs" "$@" -cp "$WORK/classes:$JAR" \
        org.counterpoise.bench.FirstWindowTime | sed -n 's/^first-window //p'
}
echo "jar $JAR, $RUNS runs, java options: ${*:-none}"
echo "cores $(nproc), load before: $(cut -d' ' -f1-3 /proc/loadavg)"
java -version 2>&1 | head -1
run "$@" > /dev/null
: > "$WORK/times"
i=0
while [ "$i" -lt "$RUNS" ]; do
    run "$@" | tee -a "$WORK/times"
    i=$((i + 1))
done
echo "median $(sort -n "$WORK/times" | sed -n "$(( (RUNS + 1) / 2 ))p") s"
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
