#!/usr/bin/env bash
# Mutation testing of the core library src/InternalStdCal with Stryker.NET (settings: stryker-config.json).
# Usage: scripts/mutation.sh all                     every file of src/InternalStdCal
#        scripts/mutation.sh Quantities [Limits ...] only the named folders (namespaces), in one run
# Folders: Quantities Preparation Calibration Quantitation Limits Uncertainty Decisions Internal Run.
# Project mode: Stryker runs from src/InternalStdCal against tests/InternalStdCal.Tests only (the netstandard2.0
# and notebook test projects would add a second, slower host per mutant without new assertions).
# Reports (html, json) go to StrykerOutput/<targets>/reports/ (overwritten by the next run of the same targets). Exit code 2 when the score is below
# the break threshold (85 %). Stryker copies mutated binaries into the test project's bin/ while it runs: do not
# run `dotnet test` in the same checkout meanwhile.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1

if [ "$#" -eq 0 ]; then set -- all; fi
mutate=()
if [ "$*" != all ]; then
  for ns in "$@"; do
    case "$ns" in
      Quantities|Preparation|Calibration|Quantitation|Limits|Uncertainty|Decisions|Internal|Run)
        mutate+=(--mutate "**/$ns/**/*.cs") ;;
      *)
        echo "usage: $0 all | <folder>... (Quantities Preparation Calibration Quantitation Limits Uncertainty Decisions Internal Run)" >&2
        exit 64 ;;
    esac
  done
fi
name=$(IFS=+; echo "$*")

dotnet tool restore >/dev/null
# Without --mutate, stryker-config.json's pattern (every file of src/InternalStdCal) applies.
root=$(pwd)
cd src/InternalStdCal
exec dotnet stryker --config-file "$root/stryker-config.json" --skip-version-check \
  --output "$root/StrykerOutput/$name" "${mutate[@]}"
