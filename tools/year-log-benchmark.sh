#!/usr/bin/env bash
# A simulated year with telemetry every minute: log size per simulated day, and the time to verify, replay,
# report and export it against the run's own time. Timings are wall-clock on this machine; read the ratios.
# Usage: tools/year-log-benchmark.sh [workdir]
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"
work="${1:-$(mktemp -d)}"
mkdir -p "$work"
dotnet build -c Release "$root/src/DescentOps.Cli" -v q -nologo > /dev/null
tool=(dotnet "$root/src/DescentOps.Cli/bin/Release/net10.0/descentops.dll")

# The default mission with a 10 km shell (the descent outlasts the year) and one frame a minute.
sed -e 's/^  thickness: 2.5 km/  thickness: 10 km/' -e 's/^  length: 3.2 km/  length: 12 km/' \
    -e 's/^  telemetry_interval: 10 min/  telemetry_interval: 1 min/' -e 's/^  until: 400 d/  until: 365 d/' \
    -e 's/^scenario: longfall-tarn-flats/scenario: year-at-one-minute/' \
    "$root/scenarios/default.yaml" > "$work/year.yaml"

timed() { local label=$1; shift; local t0=$(date +%s.%N); "$@" > "$work/$label.out" 2>&1 || true; local t1=$(date +%s.%N); printf '%-8s %8.2f s\n' "$label" "$(echo "$t1 - $t0" | bc)"; }
timed run "${tool[@]}" run "$work/year.yaml" --log "$work/year.jsonl"
timed verify "${tool[@]}" verify "$work/year.jsonl"
timed replay "${tool[@]}" replay "$work/year.jsonl"
timed report "${tool[@]}" report "$work/year.jsonl" --output "$work/year.html"
timed sqlite "${tool[@]}" export "$work/year.jsonl" --format sqlite --output "$work/year.sqlite"
bytes=$(stat -c %s "$work/year.jsonl")
echo "log: $bytes bytes, $((bytes / 365)) bytes per simulated day"
grep -h -E "wall time|events  " "$work/run.out" || true
tail -n 1 "$work/verify.out" "$work/replay.out"
