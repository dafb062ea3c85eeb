#!/usr/bin/env bash
# Whole-process timing of a job with 40 members against the same 40 beams built as 40 single
# jobs (a folder, one process, every core): both write every package; the job with members
# writes one package of all 40. Median of RUNS after one warm-up, with /usr/bin/time.
# Needs the launcher (./mvnw package). Prints seconds and the ratio.
set -euo pipefail
cd "$(dirname "$0")/../.."
RUNS=${RUNS:-3}
MEMBERS=${MEMBERS:-40}
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
mkdir -p "$out/folder"
header() {
  cat <<YAML
beamfolio: 1
project: { title: Bench framing, number: B-40, subject: $1 }
report: { units: US, paper: letter }
materials:
  dfl2: { timber: sawn, Fb: 900 psi, Fv: 180 psi, Fc_perp: 625 psi, E: 1600 ksi, Emin: 580 ksi, density: 31 pcf, size_factor: dimension }
sections:
  joist: { lumber: 2x12 }
area_loads:
  floor: { D: 12 psf, L: 40 psf }
combinations: ASCE7-ASD
design: { timber: NDS-2018, timber_service: { repetitive: true } }
checks:
  deflection:
    - { cases: [ L ], limit: L/360 }
YAML
}
# member I: a joist of 10 to 17 ft at 16 in, its own beam and loads (indented under the given prefix)
member() {
  local span=$((10 + $1 % 8))
  cat <<YAML
$2beam:
$2  length: $span ft
$2  section: joist
$2  material: dfl2
$2  supports: [ { at: 0 ft, type: pin, bearing: 3.5 in }, { at: $span ft, type: roller, bearing: 3.5 in } ]
$2  self_weight: D
$2  bracing: { top: continuous }
$2loads:
$2  - { type: area, load: floor, width: 16 in }
YAML
}
{ header "$MEMBERS members"; echo "members:"; for i in $(seq "$MEMBERS"); do echo "  - id: J-$i"; member "$i" "    "; done; } > "$out/project.yaml"
for i in $(seq "$MEMBERS"); do { header "joist J-$i"; member "$i" ""; } > "$out/folder/J-$i.yaml"; done
median() { sort -n | awk '{ a[NR] = $1 } END { print a[int((NR + 1) / 2)] }'; }
measure() {
  local label=$1; shift
  "$@" >/dev/null 2>&1
  local times=()
  for _ in $(seq "$RUNS"); do
    /usr/bin/time -f "%e" -o "$out/t" "$@" >/dev/null 2>&1
    times+=("$(cat "$out/t")")
  done
  time=$(printf '%s\n' "${times[@]}" | median)
  printf '%-40s median %6s s\n' "$label" "$time"
}
measure "job with $MEMBERS members, one package" target/beamfolio build "$out/project.yaml" --out "$out/a"
members=$time
measure "$MEMBERS single jobs, one folder" target/beamfolio build "$out/folder" --out "$out/b"
folder=$time
awk -v a="$members" -v b="$folder" 'BEGIN { printf "members / single jobs: %.2f\n", a / b }'
