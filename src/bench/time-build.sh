#!/usr/bin/env bash
# Whole-process timings, median of RUNS after one warm-up run, with /usr/bin/time:
#   - one package built cold (the simple-span example),
#   - a one-page PDF written with plain OpenPDF, and one laid out by the package's layout engine
#     (the two baselines), started the same way,
#   - folders of 20, 50 and 200 jobs (copies of the examples) in one process on every core, with
#     the time per package after the first, the peak resident memory and the heap still live
#     after the last collection (read from the collector's log).
# Needs the jar (./mvnw package). Prints seconds and megabytes. TOOL=target/beamfolio times the
# package and the folders through the launcher (its class-data archive in a fresh cache, written
# by the warm-up run) instead of java -jar.
set -euo pipefail
cd "$(dirname "$0")/../.."
RUNS=${RUNS:-5}
read -r -a TOOL <<< "${TOOL:-java -jar target/beamfolio.jar}"
BATCH_RUNS=${BATCH_RUNS:-3}
JOB=${JOB:-example-jobs/warehouse-mezzanine-simple-span.yaml}
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
export BEAMFOLIO_CACHE="$out/cache"
./mvnw -q -Pbench -DskipTests test-compile
CP=target/beamfolio.jar:target/test-classes
median() { sort -n | awk '{ a[NR] = $1 } END { print a[int((NR + 1) / 2)] }'; }
# measure LABEL RUNS COMMAND...: sets $time (median seconds) and $rss (median peak MB)
measure() {
  local label=$1 runs=$2; shift 2
  "$@" >/dev/null 2>&1
  local times=() mems=()
  for _ in $(seq "$runs"); do
    /usr/bin/time -f "%e %M" -o "$out/t" "$@" >/dev/null 2>&1
    read -r t m < "$out/t"; times+=("$t"); mems+=("$m")
  done
  time=$(printf '%s\n' "${times[@]}" | median)
  rss=$(( $(printf '%s\n' "${mems[@]}" | median) / 1024 ))
  printf '%-34s median %6s s, peak RSS %5s MB\n' "$label" "$time" "$rss"
}
measure "one package, cold" "$RUNS" "${TOOL[@]}" build "$JOB" --out "$out/one"
one=$time
measure "hello PDF (OpenPDF)" "$RUNS" java -cp "$CP" org.beamfolio.bench.HelloPdf "$out/hello.pdf"
hello=$time
measure "hello PDF (layout engine)" "$RUNS" java -cp "$CP" org.beamfolio.bench.LayoutHelloPdf "$out/layout.pdf"
awk -v a="$one" -v b="$hello" 'BEGIN { printf "one package / OpenPDF hello: %.2f\n", a / b }'
for n in 20 50 200; do
  rm -rf "$out/jobs"; mkdir "$out/jobs"
  i=0
  while [ "$i" -lt "$n" ]; do
    for f in example-jobs/*.yaml; do
      [ "$i" -ge "$n" ] && break
      cp "$f" "$out/jobs/$(basename "$f" .yaml)-$i.yaml"; i=$((i + 1))
    done
  done
  measure "folder of $n jobs" "$BATCH_RUNS" "${TOOL[@]}" build "$out/jobs" --out "$out/batch"
  awk -v t="$time" -v o="$one" -v n="$n" 'BEGIN { printf "  %d ms a package after the first\n", 1000 * (t - o) / (n - 1) }'
  java -Xlog:gc:file="$out/gc.log" -jar target/beamfolio.jar build "$out/jobs" --out "$out/batch" >/dev/null 2>&1
  grep -o '[0-9]*M->[0-9]*M([0-9]*M)' "$out/gc.log" | tail -1 \
    | awk -F'[->()M]+' '{ printf "  last collection: %s MB live of %s MB committed\n", $2, $3 }'
done
