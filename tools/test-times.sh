#!/usr/bin/env bash
# Runs each test project alone (built beforehand: `dotnet build DescentOps.sln`) and prints its wall time and the
# CPU the whole machine was busy for meanwhile (all cores, from /proc/stat), so a quiet machine gives the project's
# own CPU. The suite's wall time on N cores is at least the sum of the CPU column divided by N.
# Usage: tools/test-times.sh [Project ...]   (names without the DescentOps. prefix and .Tests suffix; default: all)
set -euo pipefail
cd "$(dirname "$0")/.."
if [ $# -eq 0 ]; then
    set -- $(ls -d tests/DescentOps.*.Tests | sed -e 's|tests/DescentOps\.||' -e 's|\.Tests$||')
fi
busy() { awk '/^cpu /{print $2+$3+$4+$7+$8+$9}' /proc/stat; }
ticks=$(getconf CLK_TCK)
printf '%-12s %8s %8s  %s\n' project wall_s cpu_s result
total_cpu=0
for project in "$@"; do
    out=$(mktemp)
    b0=$(busy); t0=$(date +%s.%N)
    if dotnet test "tests/DescentOps.$project.Tests" --no-build >"$out" 2>&1; then result=passed; else result=FAILED; fi
    b1=$(busy); t1=$(date +%s.%N)
    cpu=$(echo "($b1 - $b0) / $ticks" | bc -l)
    total_cpu=$(echo "$total_cpu + $cpu" | bc -l)
    printf '%-12s %8.1f %8.1f  %s\n' "$project" "$(echo "$t1 - $t0" | bc -l)" "$cpu" "$result"
    rm -f "$out"
done
printf '%-12s %8s %8.1f  (on %d cores: the suite needs at least %.0f s)\n' total "" "$total_cpu" "$(nproc)" "$(echo "$total_cpu / $(nproc)" | bc -l)"
