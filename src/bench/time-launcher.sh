#!/usr/bin/env bash
# The launcher against the floor, whole-process timings with /usr/bin/time. Each pair of runs is
# made side by side (launcher, then floor, then launcher...), so a drift of a shared machine's
# speed hits both, and the ratio is taken pair by pair:
#   - build of one job through target/beamfolio (its class-data archive written by a first build
#     before timing) against a one-page PDF written with plain OpenPDF (the floor), started by java;
#   - check of one job through the launcher, and build with plain java -jar, for comparison;
#   - warm rebuilds in watch: the job file saved again SAVES times, each rebuild's time as watch
#     prints it.
# Needs the jar and launcher (./mvnw package). Prints seconds, megabytes and milliseconds.
set -euo pipefail
cd "$(dirname "$0")/../.."
RUNS=${RUNS:-9}
JOB=${JOB:-example-jobs/warehouse-mezzanine-simple-span.yaml}
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
export BEAMFOLIO_CACHE="$out/cache"
./mvnw -q -Pbench -DskipTests test-compile
CP=target/beamfolio.jar:target/test-classes
median() { sort -n | awk '{ a[NR] = $1 } END { print a[int((NR + 1) / 2)] }'; }
# once FILE COMMAND...: one run; appends "seconds peak-KB" to FILE
once() {
  local file=$1; shift
  /usr/bin/time -f "%e %M" -o "$out/t" "$@" >/dev/null 2>&1 || true
  cat "$out/t" >> "$file"
}
report() { # report LABEL FILE
  printf '%-36s median %6s s, peak RSS %5s MB (%s runs)\n' "$1" "$(cut -d' ' -f1 "$2" | median)" \
    $(( $(cut -d' ' -f2 "$2" | median) / 1024 )) "$(wc -l < "$2")"
}
hello() { java -cp "$CP" org.beamfolio.bench.HelloPdf "$out/hello.pdf"; }

target/beamfolio build "$JOB" --out "$out/one" >/dev/null 2>&1   # writes the archive
hello >/dev/null 2>&1
for _ in $(seq "$RUNS"); do
  once "$out/launcher" target/beamfolio build "$JOB" --out "$out/one"
  once "$out/floor" java -cp "$CP" org.beamfolio.bench.HelloPdf "$out/hello.pdf"
  once "$out/check" target/beamfolio check "$JOB"
  once "$out/jar" java -jar target/beamfolio.jar build "$JOB" --out "$out/one"
done
report "one package, launcher" "$out/launcher"
report "floor: one-page PDF, plain OpenPDF" "$out/floor"
report "check, launcher" "$out/check"
report "one package, java -jar" "$out/jar"
paste -d' ' "$out/launcher" "$out/floor" | awk '{ print $1 / $3 }' | median \
  | awk '{ printf "launcher / floor, median of pair ratios: %.2f\n", $1 }'

# warm rebuilds: save the job again after each rebuild, read the times watch prints; the first
# half of the saves warm the compilers up and are left out of the median
SAVES=${SAVES:-20}
cp "$JOB" "$out/watched.yaml"
target/beamfolio watch "$out/watched.yaml" --out "$out/watch" --stop-after $((SAVES + 1)) > "$out/watch.log" 2>&1 &
watcher=$!
for i in $(seq "$SAVES"); do
  while [ "$(grep -c '^wrote ' "$out/watch.log")" -lt "$i" ]; do
    kill -0 "$watcher" 2>/dev/null || break 2
    sleep 0.05
  done
  echo "# saved again $i" >> "$out/watched.yaml"
done
wait "$watcher" || true
sed -n 's/^wrote .*, \([0-9]*\) ms$/\1/p' "$out/watch.log" | tail -n +$((SAVES / 2 + 2)) | median \
  | awk -v n="$SAVES" '{ printf "warm rebuild in watch: median %s ms (the last half of %s saves)\n", $1, n }'
