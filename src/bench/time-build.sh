#!/usr/bin/env bash
# Whole-process timings, median of RUNS after one warm-up run: one package built cold, a one-page
# plain OpenPDF program started the same way (the baseline), and a folder of example jobs.
# Needs the jar (./mvnw package) and /usr/bin/time. Prints seconds and peak resident memory.
set -euo pipefail
cd "$(dirname "$0")/../.."
RUNS=${RUNS:-5}
JOB=${JOB:-example-jobs/warehouse-mezzanine-simple-span.yaml}
out=$(mktemp -d)
./mvnw -q -Pbench -DskipTests test-compile
median() { sort -n | awk '{ a[NR] = $1 } END { print a[int((NR + 1) / 2)] }'; }
measure() {
  local label=$1; shift
  "$@" >/dev/null 2>&1
  local times=() mems=()
  for _ in $(seq "$RUNS"); do
    /usr/bin/time -f "%e %M" -o "$out/t" "$@" >/dev/null 2>&1
    read -r t m < "$out/t"; times+=("$t"); mems+=("$m")
  done
  printf '%-28s median %s s, peak RSS median %s MB\n' "$label" \
    "$(printf '%s\n' "${times[@]}" | median)" "$(( $(printf '%s\n' "${mems[@]}" | median) / 1024 ))"
}
measure "one package, cold" java -jar target/beamfolio.jar build "$JOB" --out "$out/one"
measure "hello PDF (OpenPDF)" java -cp target/beamfolio.jar:target/test-classes org.beamfolio.bench.HelloPdf "$out/hello.pdf"
measure "folder of example jobs" java -jar target/beamfolio.jar build example-jobs --out "$out/all"
rm -rf "$out"
