#!/usr/bin/env bash
# Fuzzes the JSON and CSV readers with AFL++ through SharpFuzz for a bounded time and keeps every
# crashing input under tools/fuzz/findings/. Usage: tools/fuzz/run.sh json|csv SECONDS
set -euo pipefail
cd "$(dirname "$0")/../.."
target=${1:-json}; seconds=${2:-600}
command -v afl-fuzz >/dev/null || { apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq afl++ >/dev/null; }
export PATH="$PATH:$HOME/.dotnet/tools"
command -v sharpfuzz >/dev/null || dotnet tool install --global SharpFuzz.CommandLine --version 2.3.0 >/dev/null
out=tools/fuzz/out
dotnet publish tools/fuzz/LoadDiff.Fuzz -c Release -o "$out" -v quiet -nologo >/dev/null
# instrument the libraries under test (not the harness)
for dll in LoadDiff.Formats.dll LoadDiff.Core.dll; do sharpfuzz "$out/$dll" >/dev/null; done
seeds=tools/fuzz/seeds-$target; rm -rf "$seeds"; mkdir -p "$seeds"
if [ "$target" = json ]; then
  find fixtures -name '*.loads.json' -size -8k -exec cp {} "$seeds/" \;
else
  find fixtures -name '*.csv' -size -8k -exec cp {} "$seeds/" \;
fi
findings=tools/fuzz/findings/$target
mkdir -p "$findings"
export AFL_SKIP_BIN_CHECK=1 AFL_NO_UI=1 AFL_I_DONT_CARE_ABOUT_MISSING_CRASHES=1 AFL_SKIP_CPUFREQ=1
afl-fuzz -V "$seconds" -i "$seeds" -o "$findings" -t 5000 -m none -- dotnet "$out/LoadDiff.Fuzz.dll" "$target" || true
stats="$findings/default/fuzzer_stats"
if [ -f "$stats" ]; then
  grep -E '^(execs_done|execs_per_sec|saved_crashes|saved_hangs|run_time|corpus_count)' "$stats"
fi
ls "$findings/default/crashes" 2>/dev/null | grep -v README || echo "no crashes"
