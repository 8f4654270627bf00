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
# GRID_RATIO_LAUNCHER=path/to/convgrid runs the grid through that launcher instead of `java -jar JAR`, with every JVM
# option it gives `run` (collector, compiler commands and directives; GRID_RATIO_JVM_OPTIONS then
# reaches it as CONVGRID_JVM_OPTIONS). To compare two builds this way, copy the first build's launcher,
# cli/run-compiler-directives.json and cli/target/convgrid.jar into a scratch directory (same layout) and run the
# script once with each launcher, back to back.
# GRID_RATIO_ONE_CORE=1 runs each 1-thread run under `taskset -c 0`, the whole JVM (JIT compilers and collector
# included) on one core, so the ratio compares one core with two rather than one worker thread with two: without it
# a 1-thread run has the JIT compile on the otherwise idle second core.
# Each run's CPU time (user + sys) is printed beside its wall: on a shared machine the walls move with the load, the
# CPU much less, and CPU / (2 x wall) says how busy both cores were.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
grid="${1:-$here/benchmarks/grids/two-hundred-zero-age.yaml}"
runs="${2:-5}"
jar="${3:-$here/cli/target/convgrid.jar}"
work="$(mktemp -d "${TMPDIR:-/tmp}/convgrid-grid-ratio.XXXXXX")"
trap 'rm -rf "$work"' EXIT

# "WALL CPU" seconds of one run with THREADS worker threads, writing into DIR (CPU: user + sys of the process).
timed_run() {
  local threads="$1" dir="$2" start end cpu pin=()
  if [ "$threads" = 1 ] && [ "${GRID_RATIO_ONE_CORE:-0}" = 1 ]; then
    pin=(taskset -c 0)
  fi
  start=$(date +%s.%N)
  if [ -n "${GRID_RATIO_LAUNCHER:-}" ]; then
    CONVGRID_JVM_OPTIONS="${GRID_RATIO_JVM_OPTIONS:-}" /usr/bin/time -f '%U %S' -o "$work/cpu" "${pin[@]}" \
      "$GRID_RATIO_LAUNCHER" run "$grid" --out "$dir" --threads "$threads" --no-refine --quiet --force \
      >/dev/null || [ $? -eq 3 ]
  else
    # word splitting intended: several options in one variable
    # shellcheck disable=SC2086
    /usr/bin/time -f '%U %S' -o "$work/cpu" "${pin[@]}" java -Djava.awt.headless=true ${GRID_RATIO_JVM_OPTIONS:-} \
      -jar "$jar" run "$grid" --out "$dir" --threads "$threads" --no-refine --quiet --force >/dev/null \
      || [ $? -eq 3 ]
  fi
  end=$(date +%s.%N)
  cpu=$(awk '{print $1 + $2}' "$work/cpu")
  echo "$(echo "$end - $start" | bc -l) $cpu"
}

median() {
  sort -g | awk '{v[NR] = $1} END {print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2}'
}

echo "grid: $grid; $runs runs per thread count; ${GRID_RATIO_LAUNCHER:+launcher: $GRID_RATIO_LAUNCHER; }$(
  [ "${GRID_RATIO_ONE_CORE:-0}" = 1 ] && echo '1-thread runs on one core (taskset -c 0); ')JVM" \
  "options: ${GRID_RATIO_JVM_OPTIONS:-none}; load before: $(cut -d' ' -f1-3 /proc/loadavg)"
one=() two=() cpu1=() cpu2=()
for ((k = 1; k <= runs; k++)); do
  read -r wall cpu < <(timed_run 1 "$work/t1")
  one+=("$wall") cpu1+=("$cpu")
  read -r wall cpu < <(timed_run 2 "$work/t2")
  two+=("$wall") cpu2+=("$cpu")
  printf 'run %d: 1 thread %.2f s (CPU %.2f s), 2 threads %.2f s (CPU %.2f s)\n' "$k" "${one[-1]}" "${cpu1[-1]}" \
    "${two[-1]}" "${cpu2[-1]}"
  cmp -s "$work/t1/catalogue.ecsv" "$work/t2/catalogue.ecsv" \
    || { echo "catalogues differ between 1 and 2 threads" >&2; exit 1; }
done
m1=$(printf '%s\n' "${one[@]}" | median)
m2=$(printf '%s\n' "${two[@]}" | median)
c1=$(printf '%s\n' "${cpu1[@]}" | median)
c2=$(printf '%s\n' "${cpu2[@]}" | median)
printf 'median wall: 1 thread %.2f s, 2 threads %.2f s; ratio 1/2 = %.2f (load after: %s)\n' \
  "$m1" "$m2" "$(echo "$m1 / $m2" | bc -l)" "$(cut -d' ' -f1-3 /proc/loadavg)"
printf 'median CPU: 1 thread %.2f s, 2 threads %.2f s; 2-thread CPU / (2 x wall) = %.2f; ratio bound by the CPU,' \
  "$c1" "$c2" "$(echo "$c2 / (2 * $m2)" | bc -l)"
printf ' 1-thread wall / (2-thread CPU / 2) = %.2f\n' "$(echo "2 * $m1 / $c2" | bc -l)"
