#!/bin/sh
# Tests of the POSIX launcher (target/beamfolio): the class-data archive is made, used, refused
# when stale or damaged, and skipped when the cache cannot be written; arguments pass through as
# given; standard output carries the tool's own output only; Java is found or refused clearly.
# Needs target/beamfolio and target/beamfolio.jar (./mvnw package). Run by ./mvnw verify and .ci/run.
set -eu
cd "$(dirname "$0")/../../.."
root=$(pwd)
[ -x target/beamfolio ] && [ -f target/beamfolio.jar ] || { echo "build first: ./mvnw package" >&2; exit 1; }

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
failures=0
fail() { echo "FAIL: $1" >&2; failures=$((failures + 1)); }
pass() { echo "ok: $1"; }

# The launcher and jar copied into a folder with a space in its name, so the jar may be touched.
bin="$work/launcher home/bin"
mkdir -p "$bin"
cp target/beamfolio target/beamfolio.jar "$bin/"
launcher="$bin/beamfolio"
cache="$work/cache folder"
job=$root/example-jobs/warehouse-mezzanine-simple-span.yaml
java=$(command -v java)

# run NAME ARGS...: the launcher with a fresh trace; stdout, stderr and status in $work/NAME.*
run() {
  name=$1; shift
  set +e
  BEAMFOLIO_CACHE=${CACHE_FOR_RUN-$cache} BEAMFOLIO_LAUNCH_TRACE=1 "$launcher" "$@" > "$work/$name.out" 2> "$work/$name.err"
  echo $? > "$work/$name.status"
  set -e
}
status() { cat "$work/$1.status"; }
traced() { grep -q -e "$2" "$work/$1.err"; }
archives() { ls "$cache"/*.jsa 2>/dev/null | wc -l | tr -d ' '; }

# --- the first build writes the archive; its stdout is the tool's own -----------------------
"$java" -jar "$bin/beamfolio.jar" build "$job" --out "$work/out" > "$work/plain-build.out"
run first build "$job" --out "$work/out"
if [ "$(status first)" = 0 ] && traced first ArchiveClassesAtExit && [ "$(archives)" = 1 ] && [ -f "$cache"/*.key ]; then
  pass "the first build writes an archive and its key"
else
  fail "the first build did not write an archive (status $(status first)): $(cat "$work/first.err")"
fi
cmp -s "$work/plain-build.out" "$work/first.out" && pass "stdout of the archiving build equals java -jar's" \
  || fail "stdout of the archiving build differs from java -jar's"
ls "$cache" | grep -q part && fail "a temporary archive was left in the cache" || pass "no temporary left in the cache"

# --- a fitting archive is used, and stdout is exactly java -jar's -----------------------------
"$java" -jar "$bin/beamfolio.jar" check "$job" > "$work/plain-check.out"
run check check "$job"
if [ "$(status check)" = 0 ] && traced check SharedArchiveFile; then pass "check uses the archive"; else fail "check did not use the archive: $(cat "$work/check.err")"; fi
cmp -s "$work/plain-check.out" "$work/check.out" && pass "stdout of check equals java -jar's" \
  || fail "stdout of check differs from java -jar's: $(diff "$work/plain-check.out" "$work/check.out" | head -5)"
[ "$(grep -v '^beamfolio launch:' "$work/check.err" | wc -c | tr -d ' ')" = 0 ] && pass "nothing but the trace on stderr" \
  || fail "check printed on stderr: $(cat "$work/check.err")"
traced check TieredStopAtLevel=1 && pass "one job runs with the quick compiler only" || fail "one job did not get the quick compiler"

# --- a truncated archive is never mapped ------------------------------------------------------
archive=$(ls "$cache"/*.jsa)
size=$(wc -c < "$archive" | tr -d ' ')
head -c $((size / 2)) "$archive" > "$work/half" && cat "$work/half" > "$archive"
run truncated check "$job"
if [ "$(status truncated)" = 0 ] && ! traced truncated SharedArchiveFile && cmp -s "$work/plain-check.out" "$work/truncated.out"; then
  pass "a truncated archive is not mapped, and check runs"
else
  fail "truncated archive: status $(status truncated), $(cat "$work/truncated.err")"
fi
run rewrite build "$job" --out "$work/out"
if [ "$(status rewrite)" = 0 ] && traced rewrite ArchiveClassesAtExit && [ "$(wc -c < "$archive" | tr -d ' ')" -gt $((size / 2)) ]; then
  pass "the next build replaces the truncated archive"
else
  fail "the truncated archive was not replaced: $(cat "$work/rewrite.err")"
fi

# --- a stale archive (another jar, another runtime) is not used ------------------------------
touch -t 202001010000 "$bin/beamfolio.jar"
run stale-jar check "$job"
if [ "$(status stale-jar)" = 0 ] && ! traced stale-jar SharedArchiveFile && cmp -s "$work/plain-check.out" "$work/stale-jar.out"; then
  pass "an archive of an earlier jar is not used"
else
  fail "stale jar: status $(status stale-jar), $(cat "$work/stale-jar.err")"
fi
run new-jar build "$job" --out "$work/out"
[ "$(archives)" = 1 ] && traced new-jar ArchiveClassesAtExit && pass "a build writes the new jar's archive and removes the earlier one" \
  || fail "after a new jar: $(archives) archives in the cache"

real_java=$(readlink -f "$java" 2>/dev/null || echo "$java")
real_home=$(dirname "$(dirname "$real_java")")
fake_runtime() { # fake_runtime DIR VERSION RUNTIME_VERSION: a runtime that runs the real java
  mkdir -p "$1/bin" "$1/lib"
  printf '#!/bin/sh\n: > "%s/ran"\nexec "%s" "$@"\n' "$1" "$real_java" > "$1/bin/java"
  chmod +x "$1/bin/java"
  printf 'JAVA_VERSION="%s"\nJAVA_RUNTIME_VERSION="%s"\n' "$2" "$3" > "$1/release"
  [ -f "$real_home/lib/modules" ] && ln -s "$real_home/lib/modules" "$1/lib/modules" || :
}
fake_runtime "$work/other-jdk" 17.0.99 17.0.99+1-other
(export JAVA_HOME="$work/other-jdk"; run other-runtime check "$job")
if [ "$(status other-runtime)" = 0 ] && [ -f "$work/other-jdk/ran" ] && ! traced other-runtime SharedArchiveFile; then
  pass "JAVA_HOME is honoured, and another runtime does not use this runtime's archive"
else
  fail "other runtime: status $(status other-runtime), $(cat "$work/other-runtime.err")"
fi

# --- an unwritable cache still runs -----------------------------------------------------------
: > "$work/a-file"
(CACHE_FOR_RUN="$work/a-file/cache"; run unwritable build "$job" --out "$work/out-unwritable")
if [ "$(status unwritable)" = 0 ] && [ -f "$work/out-unwritable/warehouse-mezzanine-simple-span.pdf" ] \
    && [ "$(grep -v '^beamfolio launch:' "$work/unwritable.err" | wc -c | tr -d ' ')" = 0 ]; then
  pass "an unwritable cache still builds, quietly"
else
  fail "unwritable cache: status $(status unwritable), $(cat "$work/unwritable.err")"
fi
(export BEAMFOLIO_CDS=off; run no-cds check "$job")
[ "$(status no-cds)" = 0 ] && ! traced no-cds SharedArchive && pass "BEAMFOLIO_CDS=off uses no archive" || fail "BEAMFOLIO_CDS=off"

# --- arguments with spaces pass through -------------------------------------------------------
mkdir -p "$work/job folder"
cp "$job" "$work/job folder/beam one.yaml"
run spaces build "$work/job folder/beam one.yaml" --out "$work/out folder"
if [ "$(status spaces)" = 0 ] && [ -f "$work/out folder/beam one.pdf" ] && [ -f "$work/out folder/beam one.results.json" ]; then
  pass "arguments with spaces pass through"
else
  fail "spaces: status $(status spaces), $(cat "$work/spaces.err")"
fi
run folder build "$work/job folder" --out "$work/out folder"
traced folder TieredStopAtLevel && fail "a folder build got the quick compiler only" || pass "a folder build runs with both compilers"

# --- no Java 17+: a clear message and status 1 ------------------------------------------------
fake_runtime "$work/old-jdk" 11.0.2 11.0.2+9
(export JAVA_HOME="$work/old-jdk"; run old-java check "$job")
[ "$(status old-java)" = 1 ] && grep -q "needs Java 17 or newer" "$work/old-java.err" && pass "Java 11 is refused with a message" \
  || fail "old Java: status $(status old-java), $(cat "$work/old-java.err")"
(export JAVA_HOME="$work/nowhere"; run no-java-home check "$job")
[ "$(status no-java-home)" = 1 ] && grep -q "JAVA_HOME is" "$work/no-java-home.err" && pass "a JAVA_HOME without java is refused with a message" \
  || fail "bad JAVA_HOME: status $(status no-java-home)"
tools="$work/tools"
mkdir "$tools"
for t in sh dirname ls sed cat cut wc tr cksum stat mkdir rm mv printf; do
  p=$(command -v "$t" 2>/dev/null) && case $p in /*) ln -s "$p" "$tools/$t" ;; esac
done
(unset JAVA_HOME; PATH="$tools"; run no-java check "$job")
[ "$(status no-java)" = 1 ] && grep -q "no Java found" "$work/no-java.err" && pass "no java on PATH is refused with a message" \
  || fail "no Java: status $(status no-java), $(cat "$work/no-java.err")"

if [ "$failures" -gt 0 ]; then
  echo "$failures launcher test(s) failed" >&2
  exit 1
fi
echo "launcher tests passed"
