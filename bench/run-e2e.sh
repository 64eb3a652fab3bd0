#!/usr/bin/env bash
# End-to-end benchmark of Cupel (docs/performance.md): for each size, generate the demo project once
# (kept under $BENCH_DIR), then run `cupel analyse` through the ./cupel launcher (its JVM options) (ingest + every analysis of the QC appendix, no
# charts) under /usr/bin/time and print wall time, peak RSS, the ingest/analysis split, rows/s and the
# ingest rate in MB/s; with REPORT=1 also time the full `cupel report` (charts, HTML, PDF, CSV).
#
#   bench/run-e2e.sh                    # 10k, 100k and 1M samples, -Xmx2g
#   bench/run-e2e.sh 10000 100000       # chosen sizes
#   HEAP=-Xmx4g bench/run-e2e.sh 1000000
#   REPORT=1 bench/run-e2e.sh 1000000   # also the full report with charts
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

# Seconds from /usr/bin/time's "Elapsed (wall clock)" line (h:mm:ss or m:ss.ss).
wall_seconds() {
  grep 'Elapsed (wall clock)' "$1" | awk '{print $NF}' \
    | awk -F: '{ if (NF==3) print $1*3600+$2*60+$3; else print $1*60+$2 }'
}
peak_rss_mb() {
  grep 'Maximum resident set size' "$1" | awk '{print int($NF/1024)}'
}
json_number() {
  grep "\"$2\"" "$1" | head -1 | tr -dc '0-9'
}

printf '%-9s %7s %8s %9s %11s %9s %10s %10s %9s\n' samples csv_MB wall_s ingest_s analyses_s ingest_MB/s peak_RSS_MB rows "rows/s"
for n in "${sizes[@]}"; do
  project="$dir/demo-$n"
  if [ ! -f "$project/register.csv" ]; then
    java -Xmx2g -jar "$jar" demo "$project" --samples "$n" --force >/dev/null
  fi
  mb=$(du -cm "$project"/register.csv "$project"/lab | tail -1 | cut -f1)
  log="$dir/analyse-$n.log"
  CUPEL_JAVA_OPTS="$heap" /usr/bin/time -v "$here/cupel" analyse "$project" --json-summary \
    >"$dir/analyse-$n.json" 2>"$log"
  wall=$(wall_seconds "$log")
  ingest=$(json_number "$dir/analyse-$n.json" ingestMillis)
  analyses=$(json_number "$dir/analyse-$n.json" analysisMillis)
  rows=$(json_number "$dir/analyse-$n.json" samples)
  printf '%-9s %7s %8s %9.1f %11.1f %9.1f %10s %10s %9.0f\n' "$n" "$mb" "$wall" "$(echo "$ingest/1000" | bc -l)" \
    "$(echo "$analyses/1000" | bc -l)" "$(echo "$mb*1000/$ingest" | bc -l)" "$(peak_rss_mb "$log")" "$rows" \
    "$(echo "$rows/$wall" | bc -l)"
  # Each analysis chain's own wall time (the chains overlap on two cores).
  tr -d '\n ' <"$dir/analyse-$n.json" | grep -o '"stageMillis":{[^}]*}' | sed 's/^/          stages /'
  if [ "${REPORT:-0}" = 1 ]; then
    rlog="$dir/report-$n.log"
    CUPEL_JAVA_OPTS="$heap" /usr/bin/time -v "$here/cupel" report "$project" --out "$dir/report-$n" \
      --force --quiet >/dev/null 2>"$rlog"
    printf '          report with charts: wall %s s, peak RSS %s MB, %s charts, PDF %s MB\n' "$(wall_seconds "$rlog")" \
      "$(peak_rss_mb "$rlog")" "$(ls "$dir/report-$n/charts" | wc -l)" \
      "$(du -m "$dir/report-$n/appendix.pdf" | cut -f1)"
  fi
done
