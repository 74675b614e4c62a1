#!/usr/bin/env bash
# Whole-process benchmark: generates the data sets, publishes LoadDiff (Native AOT), then runs
# LoadDiff and its peers on the same files in the same run, alternating, several times, and prints
# a table of medians, ratios and peak memory. Usage: bench/run.sh [--rows N] [--triangles N] [--runs N]
set -euo pipefail
cd "$(dirname "$0")/.."
rows=10000000; triangles=1000000; runs=5
while [ $# -gt 0 ]; do
  case "$1" in
    --rows) rows=$2; shift 2 ;;
    --triangles) triangles=$2; shift 2 ;;
    --runs) runs=$2; shift 2 ;;
    *) echo "usage: bench/run.sh [--rows N] [--triangles N] [--runs N]" >&2; exit 2 ;;
  esac
done

need=()
/usr/bin/python3 -c "import numpy, pandas" 2>/dev/null || need+=(python3-numpy python3-pandas)
[ -x /usr/bin/time ] || need+=(time)
if [ ${#need[@]} -gt 0 ]; then
  echo "installing ${need[*]} (Debian packages)" >&2
  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${need[@]}" >/dev/null
fi

data=bench/data; out=bench/out
mkdir -p "$data" "$out"
points="$data/points-$rows.csv"; mesh="$data/mesh-$triangles.csv"
[ -s "$points" ] || { echo "generating $points" >&2; awk -v n="$rows" -f bench/gen_points.awk > "$points"; }
[ -s "$mesh" ] || { echo "generating $mesh" >&2; awk -v n="$triangles" -f bench/gen_mesh.awk > "$mesh"; }
stem=$(basename "$points" .csv); mstem=$(basename "$mesh" .csv)
# Small substitutes with a case of the same name as the CSV stem, so check reads the big file once.
printf '{ "cases": { "%s": { "loads": [ { "id": "r", "kind": "force", "at": [512100, 6170025, 40.5], "value": [0, 0, -1] } ] } } }\n' "$stem" > "$out/points-substitute.loads.json"
printf '{ "cases": { "%s": { "loads": [ { "id": "r", "kind": "force", "at": [0, 0, 12], "value": [0, 0, -1] } ] } } }\n' "$mstem" > "$out/mesh-substitute.loads.json"

# Native AOT for this machine's instruction set (needs a C toolchain: gcc here; on a bare Debian machine
# apt-get install clang zlib1g-dev): without it the AOT compiler targets the oldest x64 processors, where the
# 256-bit vectors and FMA of the reduction are emulated. ReadyToRun when AOT cannot be built (the JIT then
# uses what the processor has).
echo "publishing loaddiff (Release, Native AOT for this processor)" >&2
if dotnet publish src/LoadDiff.Cli -c Release -r linux-x64 -p:PublishAot=true -p:IlcInstructionSet=native \
    -o "$out/aot" -v quiet -nologo >/dev/null 2>&1; then
  ld="$out/aot/loaddiff"; build="Native AOT (IlcInstructionSet=native)"
else
  echo "Native AOT publish failed; using ReadyToRun" >&2
  dotnet publish src/LoadDiff.Cli -c Release -r linux-x64 --self-contained false -p:PublishReadyToRun=true \
    -o "$out/r2r" -v quiet -nologo >/dev/null
  ld="$out/r2r/loaddiff"; build="ReadyToRun"
fi

# run LABEL CMD... : appends "seconds peak_kib" to $out/LABEL.times (wall time from a ns clock,
# since /usr/bin/time resolves only 10 ms; peak resident memory from /usr/bin/time)
run() {
  local label=$1; shift
  local t0 t1 code=0
  t0=$(date +%s%N)
  /usr/bin/time -f "%M" -o "$out/.t" "$@" >/dev/null 2>"$out/.err" || code=$?
  t1=$(date +%s%N)
  if [ "$code" -gt 1 ]; then echo "$label failed ($code):" >&2; cat "$out/.err" >&2; exit 1; fi
  echo "$(awk -v a="$t0" -v b="$t1" 'BEGIN { printf "%.4f", (b - a) / 1e9 }') $(tail -1 "$out/.t")" >> "$out/$label.times"
}
median() { sort -n | awk '{a[NR]=$1} END {print (NR%2 ? a[(NR+1)/2] : (a[NR/2]+a[NR/2+1])/2)}'; }
peak() { awk '{print $2}' "$out/$1.times" | sort -n | tail -1; }

rm -f "$out"/*.times
for i in $(seq "$runs"); do
  echo "round $i of $runs" >&2
  run wc_points wc -l "$points"
  run ld_points "$ld" check "$points" "$out/points-substitute.loads.json" --format json
  run pandas_points /usr/bin/python3 bench/peers/reduce_points.py "$points"
  run ld_mesh "$ld" reduce "$mesh" --format json
  run numpy_mesh /usr/bin/python3 bench/peers/reduce_mesh.py "$mesh"
  run ld_small "$ld" check fixtures/footbridge/detailed.loads.json fixtures/footbridge/simplified.loads.json
  run git_small git diff --no-index --stat fixtures/footbridge/detailed.loads.json fixtures/footbridge/simplified.loads.json
done

m() { awk '{print $1}' "$out/$1.times" | median; }
ratio() { awk -v a="$1" -v b="$2" 'BEGIN { if (b > 0) printf "%.2f", a / b; else print "n/a" }'; }
{
  echo "loaddiff build: $build"
  echo "machine: $(nproc) cores, $(free -g | awk '/Mem/ {print $2}') GiB, $(uname -sr); runs: $runs (medians)"
  echo "points: $rows rows, $(du -h "$points" | cut -f1); mesh: $triangles triangles, $(du -h "$mesh" | cut -f1)"
  echo
  echo "| task | LoadDiff s | peer | peer s | ratio LoadDiff/peer | LoadDiff peak MiB | target |"
  echo "|---|---:|---|---:|---:|---:|---|"
  echo "| check, $rows point loads | $(m ld_points) | wc -l | $(m wc_points) | $(ratio "$(m ld_points)" "$(m wc_points)") | $(( $(peak ld_points) / 1024 )) | ≤ 4, < 100 MiB |"
  echo "| same | $(m ld_points) | pandas + numpy | $(m pandas_points) | $(ratio "$(m ld_points)" "$(m pandas_points)") | | ≤ 0.2 |"
  echo "| reduce, $triangles mesh triangles | $(m ld_mesh) | numpy | $(m numpy_mesh) | $(ratio "$(m ld_mesh)" "$(m numpy_mesh)") | $(( $(peak ld_mesh) / 1024 )) | ≤ 0.5 |"
  echo "| check, small pair | $(m ld_small) | git diff --no-index | $(m git_small) | $(ratio "$(m ld_small)" "$(m git_small)") | $(( $(peak ld_small) / 1024 )) | ≤ 5 |"
} | tee "$out/summary.md"
