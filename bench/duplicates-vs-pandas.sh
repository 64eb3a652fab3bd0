#!/usr/bin/env bash
# Side-by-side benchmark (docs/performance.md, "Duplicates against a pandas script"): `cupel duplicates
# pairs.csv --json` through the ./cupel launcher against bench/pairs_pandas.py, the script a user would write
# with pandas for the same statistics (HARD, % within 10 %, RMS CV, s_r, Thompson–Howarth), on generated pairs
# files of each size (bench/make_pairs.py, fixed seed, kept under $BENCH_DIR). The runs are interleaved
# (Cupel, pandas, Cupel, ...), RUNS of each; the script prints each wall time, the medians and the ratio
# Cupel / pandas, and the two programs' numbers side by side for the last file. Then, unless E2E=0, it runs
# bench/run-e2e.sh for the 1M-sample project (REPORT=1 also times the full report).
#
#   bench/duplicates-vs-pandas.sh                      # 1M and 10M pairs, 3 runs each, then the 1M project
#   RUNS=5 E2E=0 bench/duplicates-vs-pandas.sh 1000000
#   PYTHON=/usr/bin/python3 HEAP=-Xmx2g bench/duplicates-vs-pandas.sh
#
# Needs python3 with numpy and pandas (Debian: apt-get install python3-pandas). Times are wall-clock seconds
# from /usr/bin/time; on a shared machine, check `uptime` first (see docs/performance.md).
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
dir="${BENCH_DIR:-/tmp/cupel-bench}"
runs="${RUNS:-3}"
heap="${HEAP:--Xmx2g}"
seed=20261203
sizes=("$@")
[ ${#sizes[@]} -eq 0 ] && sizes=(1000000 10000000)
python="${PYTHON:-}"
if [ -z "$python" ]; then
  for p in python3 /usr/bin/python3; do
    if "$p" -c 'import pandas' 2>/dev/null; then python="$p"; break; fi
  done
fi
if [ -z "$python" ]; then
  echo "duplicates-vs-pandas: no python3 with pandas found; install python3-pandas or set PYTHON" >&2
  exit 2
fi
"$here/cupel" --version >/dev/null   # builds the jar when needed
mkdir -p "$dir"

median() { sort -g | awk '{v[NR]=$1} END {print (NR%2 ? v[(NR+1)/2] : (v[NR/2]+v[NR/2+1])/2)}'; }
timed() { # command... ; prints the wall seconds, the command's output to $out
  /usr/bin/time -f '%e' -o "$dir/time.txt" "$@" >"$out" 2>"$dir/stderr.txt" || { cat "$dir/stderr.txt" >&2; exit 1; }
  cat "$dir/time.txt"
}

echo "machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ //'), $(free -g | awk '/Mem:/ {print $2}') GiB; load: $(cut -d' ' -f1-3 /proc/loadavg)"
echo "$("$python" -c 'import pandas, numpy, sys; print("pandas", pandas.__version__, "numpy", numpy.__version__, "python", sys.version.split()[0])'); $(java -version 2>&1 | head -1)"
printf '%-9s %6s %-26s %-26s %7s\n' pairs MB "cupel wall s (runs)" "pandas wall s (runs)" ratio
for n in "${sizes[@]}"; do
  pairs="$dir/pairs-$n.csv"
  [ -f "$pairs" ] || "$python" "$here/bench/make_pairs.py" "$n" "$seed" "$pairs"
  c=(); p=()
  for ((i = 0; i < runs; i++)); do
    out="$dir/cupel-$n.json"; c+=("$(CUPEL_JAVA_OPTS="$heap" timed "$here/cupel" duplicates "$pairs" --json)")
    out="$dir/pandas-$n.json"; p+=("$(timed "$python" "$here/bench/pairs_pandas.py" "$pairs")")
  done
  cm=$(printf '%s\n' "${c[@]}" | median); pm=$(printf '%s\n' "${p[@]}" | median)
  printf '%-9s %6s %-26s %-26s %7.2f\n' "$n" "$(du -m "$pairs" | cut -f1)" "$cm (${c[*]})" "$pm (${p[*]})" \
    "$(echo "$cm / $pm" | bc -l)"
done
# The comparator must compute what Cupel computes: both sets of numbers for the last file.
"$python" - "$dir/cupel-$n.json" "$dir/pandas-$n.json" <<'PY'
import json, sys
c = json.load(open(sys.argv[1]))["analytes"][0]["sets"][0]
p = json.load(open(sys.argv[2]))
pr, th = c["precision"], c["model"]
rows = [
    ("pairs used", pr["usedRelative"], p["used"]),
    ("median HARD %", 100 * pr["medianHard"]["value"], p["medianHardPercent"]),
    ("% within 10 %", pr["percentWithinLimit"]["value"], p["percentWithin10"]),
    ("RMS CV %", 100 * pr["rmsCv"]["value"], p["rmsCvPercent"]),
    ("s_r", pr["repeatabilitySd"]["value"], p["repeatabilitySd"]),
    ("TH groups", th["groups"]["count"], p["thGroups"]),
    ("TH sigma0", th["thompsonHowarth"]["model"]["sigma0"], p["thSigma0"]),
    ("TH k", th["thompsonHowarth"]["model"]["k"], p["thK"]),
]
print("%-15s %22s %22s %10s" % ("statistic", "cupel", "pandas", "rel. diff"))
for name, a, b in rows:
    print("%-15s %22.12g %22.12g %10.2g" % (name, a, b, abs(a - b) / max(abs(b), 1e-300)))
PY
if [ "${E2E:-1}" = 1 ]; then
  echo "1M-sample project (bench/run-e2e.sh):"
  HEAP="$heap" BENCH_DIR="$dir" "$here/bench/run-e2e.sh" 1000000
fi
