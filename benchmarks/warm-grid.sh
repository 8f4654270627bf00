#!/usr/bin/env bash
# The grid's own cost without the JIT's warm-up: the grid run ROUNDS times in one JVM, at 1 and then at 2 worker
# threads (one JVM each), each round's wall and process CPU printed; the medians of rounds 2..ROUNDS are compared
# (round 1 pays the compilers). Beside benchmarks/grid-ratio.sh, which times whole processes (what a user waits for),
# this says how much of that is the grid's work and how evenly two threads share it.
#
#   benchmarks/warm-grid.sh [GRID.yaml] [ROUNDS] [JAR]
#
# Defaults: benchmarks/grids/two-hundred-zero-age.yaml, 5 rounds, cli/target/convgrid.jar (build it first:
# ./mvnw -B -ntp -o -q -pl cli -am package -DskipTests). JVM options as the launcher gives `run`'s collector
# (-XX:+UseSerialGC); WARM_GRID_JVM_OPTIONS adds more.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
grid="${1:-$here/benchmarks/grids/two-hundred-zero-age.yaml}"
rounds="${2:-5}"
jar="${3:-$here/cli/target/convgrid.jar}"
[ "$rounds" -ge 2 ] || { echo "warm-grid.sh: ROUNDS must be at least 2" >&2; exit 2; }
work="$(mktemp -d "${TMPDIR:-/tmp}/convgrid-warm-grid.XXXXXX")"
trap 'rm -rf "$work"' EXIT

median() {
  sort -g | awk '{v[NR] = $1} END {print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2}'
}

echo "grid: $grid; $rounds rounds per JVM; load before: $(cut -d' ' -f1-3 /proc/loadavg)"
for threads in 1 2; do
  # word splitting intended: several options in one variable
  # shellcheck disable=SC2086
  java -Djava.awt.headless=true -XX:+UseSerialGC ${WARM_GRID_JVM_OPTIONS:-} -cp "$jar" \
    "$here/benchmarks/warm/WarmGridRuns.java" "$rounds" run "$grid" --out "$work/t$threads" --threads "$threads" \
    --no-refine --quiet --force | tee "$work/rounds$threads" | sed "s/^/$threads thread(s): /"
done
cmp -s "$work/t1/catalogue.ecsv" "$work/t2/catalogue.ecsv" \
  || { echo "catalogues differ between 1 and 2 threads" >&2; exit 1; }
w1=$(awk 'NR > 1 {print $6}' "$work/rounds1" | median)
w2=$(awk 'NR > 1 {print $6}' "$work/rounds2" | median)
c1=$(awk 'NR > 1 {print $9}' "$work/rounds1" | median)
c2=$(awk 'NR > 1 {print $9}' "$work/rounds2" | median)
printf 'warm rounds, medians: 1 thread %.2f s (CPU %.2f s), 2 threads %.2f s (CPU %.2f s); ratio 1/2 = %.2f;' \
  "$w1" "$c1" "$w2" "$c2" "$(echo "$w1 / $w2" | bc -l)"
printf ' 2-thread CPU / (2 x wall) = %.2f (load after: %s)\n' "$(echo "$c2 / (2 * $w2)" | bc -l)" \
  "$(cut -d' ' -f1-3 /proc/loadavg)"
