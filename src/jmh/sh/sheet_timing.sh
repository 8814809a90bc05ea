#!/bin/sh
# Whole-process time of `counterpoise sheet` for every shipped preset (docs/performance.md).
#
#   src/jmh/sh/sheet_timing.sh [JAR] [RUNS] [JAVA OPTIONS...]
#
# JAR defaults to target/counterpoise.jar, RUNS to 5. Each preset's sheet is written RUNS times to a
# temporary folder; for each preset the script prints the median, least and greatest wall time and
# the median CPU time (user + system, all threads) of the whole process, as /usr/bin/time reports
# them. The machine's core count and load average are printed before and after: on a shared
# machine the wall time follows the load, the CPU time much less.
set -eu
JAR=${1:-target/counterpoise.jar}
RUNS=${2:-5}
[ $# -ge 1 ] && shift
[ $# -ge 1 ] && shift
OUT=$(mktemp -d)
trap 'rm -rf "$OUT"' EXIT
echo "jar $JAR, $RUNS runs per preset, java options: ${*:-none}"
echo "cores $(nproc), load before: $(cut -d' ' -f1-3 /proc/loadavg)"
java -version 2>&1 | head -1
printf '%-30s %10s %10s %10s %12s\n' preset "median s" "least s" "most s" "median cpu s"
for preset in presets/*.json; do
    name=$(basename "$preset" .json)
    : > "$OUT/times"
    i=0
    while [ "$i" -lt "$RUNS" ]; do
        /usr/bin/time -f '%e %U %S' -o "$OUT/one" java "$@" -jar "$JAR" sheet "$preset" -o "$OUT/$name.pdf" --force > /dev/null
        cat "$OUT/one" >> "$OUT/times"
        i=$((i + 1))
    done
    wall=$(cut -d' ' -f1 "$OUT/times" | sort -n)
    cpu=$(awk '{ print $2 + $3 }' "$OUT/times" | sort -n)
    mid=$(( (RUNS + 1) / 2 ))
    printf '%-30s %10s %10s %10s %12s\n' "$name" "$(echo "$wall" | sed -n "${mid}p")" \
        "$(echo "$wall" | head -1)" "$(echo "$wall" | tail -1)" "$(echo "$cpu" | sed -n "${mid}p")"
done
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
