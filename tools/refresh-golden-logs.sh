#!/bin/sh
# Rewrites tests/golden/*.jsonl from the current code: short runs of every built-in scenario (see GoldenLogTests).
# Run it only when a change alters logs on purpose, and say in the commit why the logs changed.
set -eu
cd "$(dirname "$0")/.."
DESCENTOPS_REFRESH_GOLDEN=1 dotnet test tests/DescentOps.Mission.Tests --filter "FullyQualifiedName~GoldenLogTests" "$@"
git status --short tests/golden
