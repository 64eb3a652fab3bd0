#!/usr/bin/env bash
# End-to-end benchmark of Cupel (docs/performance.md): for each size, generate the demo project once
# (kept under $BENCH_DIR), then run `cupel analyse` (ingest + every analysis of the QC appendix, no
# charts) under /usr/bin/time and print wall time, peak RSS, the ingest/analysis split and rows/s.
#
#   bench/run-e2e.sh                    # 10k, 100k and 1M samples, -Xmx2g
#   bench/run-e2e.sh 10000 100000       # chosen sizes
#   HEAP=-Xmx4g bench/run-e2e.sh 1000000
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
jar="$here/cli/target/cupel.jar"
heap="${HEAP:--Xmx2g}"
dir="${BENCH_DIR:-/tmp/cupel-bench}"
sizes=("$@")
[ ${#sizes[@]} -eq 0 ] && sizes=(10000 100000 1000000)
if [ ! -f "$jar" ]; then
  (cd "$here" && mvn -B -q -DskipTests package) >&2
fi
mkdir -p "$dir"
printf '%-9s %9s %9s %11s %11s %11s %10s %12s\n' samples csv_MB wall_s ingest_s analyses_s peak_RSS_MB rows "rows/s"
for n in "${sizes[@]}"; do
  project="$dir/demo-$n"
  if [ ! -f "$project/register.csv" ]; then
    java -Xmx2g -jar "$jar" demo "$project" --samples "$n" --force >/dev/null
  fi
  mb=$(du -cm "$project"/register.csv "$project"/lab | tail -1 | cut -f1)
  log="$dir/analyse-$n.log"
  /usr/bin/time -v java "$heap" -Djava.awt.headless=true -jar "$jar" analyse "$project" --json-summary \
    >"$dir/analyse-$n.json" 2>"$log"
  wall=$(grep 'Elapsed (wall clock)' "$log" | awk '{print $NF}' | awk -F: '{ if (NF==3) print $1*3600+$2*60+$3; else print $1*60+$2 }')
  rss=$(grep 'Maximum resident set size' "$log" | awk '{print int($NF/1024)}')
  ingest=$(grep '"ingestMillis"' "$dir/analyse-$n.json" | tr -dc '0-9')
  analyses=$(grep '"analysisMillis"' "$dir/analyse-$n.json" | tr -dc '0-9')
  rows=$(grep '"samples"' "$dir/analyse-$n.json" | head -1 | tr -dc '0-9')
  printf '%-9s %9s %9s %11.1f %11.1f %11s %10s %12.0f\n' "$n" "$mb" "$wall" "$(echo "$ingest/1000" | bc -l)" \
    "$(echo "$analyses/1000" | bc -l)" "$rss" "$rows" "$(echo "$rows/$wall" | bc -l)"
done
