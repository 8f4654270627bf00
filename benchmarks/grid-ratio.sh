#!/usr/bin/env bash
# Whole-grid wall time at 1 and 2 worker threads and their ratio (1 thread / 2 threads; 2.0 = both cores fully
# used). Runs are interleaved (1, 2, 1, 2, ...) so both see the same machine load; the medians are compared.
# Checks on the way that the catalogues of the two thread counts are byte-identical.
#
#   benchmarks/grid-ratio.sh [GRID.yaml] [RUNS] [JAR]
#
# Defaults: benchmarks/grids/two-hundred-zero-age.yaml (4 Z x 50 masses 0.1-20 Msun, zero age), 5 runs each,
# cli/target/convgrid.jar (build it first: ./mvnw -B -ntp -o -q -pl cli -am package -DskipTests).
# GRID_RATIO_JVM_OPTIONS adds JVM options to every run, e.g. GRID_RATIO_JVM_OPTIONS=-XX:+UseSerialGC, the collector
# the launcher gives `run` (without it the JVM's defaults are measured, as before).
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
grid="${1:-$here/benchmarks/grids/two-hundred-zero-age.yaml}"
runs="${2:-5}"
jar="${3:-$here/cli/target/convgrid.jar}"
work="$(mktemp -d "${TMPDIR:-/tmp}/convgrid-grid-ratio.XXXXXX")"
trap 'rm -rf "$work"' EXIT

# Wall seconds of one run with THREADS worker threads, writing into DIR.
timed_run() {
  local threads="$1" dir="$2" start end
  start=$(date +%s.%N)
  # word splitting intended: several options in one variable
  # shellcheck disable=SC2086
  java -Djava.awt.headless=true ${GRID_RATIO_JVM_OPTIONS:-} -jar "$jar" run "$grid" --out "$dir" \
    --threads "$threads" --no-refine --quiet --force >/dev/null || [ $? -eq 3 ]
  end=$(date +%s.%N)
  echo "$end - $start" | bc -l
}

median() {
  sort -g | awk '{v[NR] = $1} END {print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2}'
}

echo "grid: $grid; $runs runs per thread count; JVM options: ${GRID_RATIO_JVM_OPTIONS:-none};" \
  "load before: $(cut -d' ' -f1-3 /proc/loadavg)"
one=() two=()
for ((k = 1; k <= runs; k++)); do
  one+=("$(timed_run 1 "$work/t1")")
  two+=("$(timed_run 2 "$work/t2")")
  printf 'run %d: 1 thread %.2f s, 2 threads %.2f s\n' "$k" "${one[-1]}" "${two[-1]}"
  cmp -s "$work/t1/catalogue.ecsv" "$work/t2/catalogue.ecsv" \
    || { echo "catalogues differ between 1 and 2 threads" >&2; exit 1; }
done
m1=$(printf '%s\n' "${one[@]}" | median)
m2=$(printf '%s\n' "${two[@]}" | median)
printf 'median wall: 1 thread %.2f s, 2 threads %.2f s; ratio 1/2 = %.2f (load after: %s)\n' \
  "$m1" "$m2" "$(echo "$m1 / $m2" | bc -l)" "$(cut -d' ' -f1-3 /proc/loadavg)"
