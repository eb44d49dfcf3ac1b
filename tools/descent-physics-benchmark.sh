#!/usr/bin/env bash
# The default run's wall time with the side balance against the commit before it, measured side by side in one run
# (alternating, three runs each, median). Both trees are built in Release; the older one is exported with git archive
# into a temporary folder, so no worktree is added. Read the ratio, not the seconds.
# Usage: tools/descent-physics-benchmark.sh [BASE-COMMIT] [RUNS]
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"
first=$(git -C "$root" log --diff-filter=A --format=%H -- src/DescentOps.Physics/Descent/SideBalance.cs | tail -n 1)
base="${1:-$first^}"
runs="${2:-3}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
git -C "$root" archive "$base" | tar -x -C "$work"
echo "building current tree and $(git -C "$root" rev-parse --short "$base") ..."
dotnet build -c Release "$root/src/DescentOps.Cli" -v q -nologo > /dev/null
dotnet build -c Release "$work/src/DescentOps.Cli" -v q -nologo > /dev/null
new=(dotnet "$root/src/DescentOps.Cli/bin/Release/net10.0/descentops.dll")
old=(dotnet "$work/src/DescentOps.Cli/bin/Release/net10.0/descentops.dll")

seconds() { local t0 t1; t0=$(date +%s.%N); "$@" > /dev/null 2>&1 || true; t1=$(date +%s.%N); echo "$t1 - $t0" | bc; }
median() { printf '%s\n' "$@" | sort -g | awk '{a[NR]=$1} END {print a[int((NR+1)/2)]}'; }
old_times=(); new_times=()
for i in $(seq "$runs"); do
  old_times+=("$(seconds "${old[@]}" run --log "$work/old-$i.jsonl")")
  new_times+=("$(seconds "${new[@]}" run --log "$work/new-$i.jsonl")")
done
o=$(median "${old_times[@]}"); n=$(median "${new_times[@]}")
printf 'previous (%s): %s s   current: %s s   (medians of %s runs of the default scenario)\n' "$(git -C "$root" rev-parse --short "$base")" "$o" "$n" "$runs"
printf 'ratio current/previous: %.2f (limit 1.5)\n' "$(echo "$n / $o" | bc -l)"
