#!/usr/bin/env bash
# Mutation testing of LoadDiff.Core with the local dotnet-stryker tool (.config/dotnet-tools.json), driven
# by the Core test project. Each argument is a file or glob to mutate, relative to the repository root
# (a leading '!' excludes). Default: the verdict code, Core/Equivalence and Reduction/Box.cs.
# Reports (html, json, cleartext) go to tools/mutation/output/; the score per file and every surviving
# mutant are printed at the end from the JSON report.
#   tools/mutation/run.sh
#   tools/mutation/run.sh 'src/LoadDiff.Core/Reduction/WrenchAnalysis.cs'
set -euo pipefail
here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
root=$(cd "$here/../.." && pwd)
project_dir=src/LoadDiff.Core
test_dir=tests/LoadDiff.Core.Tests
out="$here/output"

[ $# -gt 0 ] || set -- "$project_dir/Equivalence/**/*.cs" "$project_dir/Reduction/Box.cs"

# The tool matches patterns against paths inside the mutated project: strip the repository prefix.
mutate=()
scope=()
for pattern in "$@"; do
  negate=
  if [ "${pattern#!}" != "$pattern" ]; then negate='!'; pattern=${pattern#!}; fi
  pattern=${pattern#"$root/"}
  pattern=${pattern#./}
  case "$pattern" in
    "$project_dir"/*) pattern=${pattern#"$project_dir/"} ;;
    *) echo "run.sh: '$pattern' is not under $project_dir (only Core is mutated)" >&2; exit 2 ;;
  esac
  mutate+=(--mutate "$negate$pattern")
  scope+=("$negate$project_dir/$pattern")
done

cd "$root"
dotnet tool restore >/dev/null
rm -rf "$out"
mkdir -p "$out"
cd "$root/$test_dir"
start=$(date +%s)
# The console output (progress and the cleartext table) is kept beside the reports.
set +e
dotnet tool run dotnet-stryker -- \
  --config-file "$here/stryker-config.json" \
  --output "$out" \
  --skip-version-check \
  "${mutate[@]}" 2>&1 | tee "$out/console.txt"
status=${PIPESTATUS[0]}
set -e
echo "wall time: $(( $(date +%s) - start )) s" | tee -a "$out/console.txt"

report=$(find "$out" -name 'mutation-report.json' -print -quit)
if [ -z "$report" ]; then
  echo "run.sh: no JSON report under $out (the tool exited with $status)" >&2
  exit 1
fi
python3 - "$report" "$root" "${scope[@]}" <<'PY' | tee "$out/summary.txt"
import glob, json, os, sys

report_path, root, patterns = sys.argv[1], sys.argv[2], sys.argv[3:]
with open(report_path, encoding="utf-8") as f:
    report = json.load(f)
project_root = report.get("projectRoot") or root

def relative(path):
    full = path if os.path.isabs(path) else os.path.join(project_root, path)
    return os.path.relpath(full, root)

def span_text(lines, loc):
    # Report locations are 1-based; the end column is exclusive.
    (l0, c0), (l1, c1) = (loc["start"]["line"], loc["start"]["column"]), (loc["end"]["line"], loc["end"]["column"])
    if l0 == l1:
        return lines[l0 - 1][c0 - 1:c1 - 1]
    return "\n".join([lines[l0 - 1][c0 - 1:]] + lines[l0:l1 - 1] + [lines[l1 - 1][:c1 - 1]])

def one_line(text, limit=100):
    text = " ".join(text.split())
    return text if len(text) <= limit else text[:limit - 1] + "…"

# The files asked for (the tool mutates the whole project and marks the rest "Removed by mutate filter").
in_scope = set()
for p in patterns:
    files = {os.path.relpath(f, root) for f in glob.glob(os.path.join(root, p.lstrip("!")), recursive=True)}
    in_scope = in_scope - files if p.startswith("!") else in_scope | files

detected, undetected = {"Killed", "Timeout"}, {"Survived", "NoCoverage"}
rows, survivors = [], []
for path, entry in sorted(report["files"].items(), key=lambda kv: relative(kv[0])):
    name = relative(path)
    if name not in in_scope:
        continue
    lines = entry["source"].split("\n")
    counts = {}
    for m in entry["mutants"]:
        counts[m["status"]] = counts.get(m["status"], 0) + 1
        if m["status"] in undetected:
            survivors.append((name, m["location"]["start"]["line"], m, span_text(lines, m["location"]),
                              lines[m["location"]["start"]["line"] - 1].strip()))
    det = sum(counts.get(s, 0) for s in detected)
    und = sum(counts.get(s, 0) for s in undetected)
    score = f"{100.0 * det / (det + und):7.2f} %" if det + und else "no mutant"
    rows.append((name, score, det, counts.get("Survived", 0), counts.get("NoCoverage", 0),
                 counts.get("CompileError", 0), counts.get("Ignored", 0), counts.get("Timeout", 0)))

print()
print("Mutation score per file: killed (timeouts included) / (killed + survived + no coverage);")
print("compile errors and ignored mutants are left out.")
width = max([len(r[0]) for r in rows] + [4])
print(f"{'file':<{width}}  {'score':>9}  killed  (timeout)  survived  no-cover  compile-err  ignored")
for name, score, det, surv, nocov, comp, ign, tout in rows:
    print(f"{name:<{width}}  {score:>9}  {det:6d}  {tout:9d}  {surv:8d}  {nocov:8d}  {comp:11d}  {ign:7d}")
print()
tot_det, tot_all = sum(r[2] for r in rows), sum(r[2] + r[3] + r[4] for r in rows)
if tot_all:
    print(f"{'all':<{width}}  {100.0 * tot_det / tot_all:7.2f} %  {tot_det:6d}  {sum(r[7] for r in rows):9d}  "
          f"{sum(r[3] for r in rows):8d}  {sum(r[4] for r in rows):8d}")
print()
print(f"Surviving mutants ({len(survivors)}; 'NoCoverage' = no test runs that code)")
for name, line, m, original, text in sorted(survivors, key=lambda s: (s[0], s[1], s[2]["location"]["start"]["column"])):
    tag = "" if m["status"] == "Survived" else " [NoCoverage]"
    print(f"{name}:{line}: {m['mutatorName']}{tag}: {one_line(original)}  ->  {one_line(m.get('replacement', ''))}")
    print(f"    | {one_line(text, 160)}")
PY
exit "$status"
