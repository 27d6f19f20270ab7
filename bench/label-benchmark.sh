#!/usr/bin/env bash
# Labeling throughput with a large vocabulary, beside an analysis-only pass and a regex baseline, in one run.
#   bench/label-benchmark.sh                 1,000,000 generated listings (JSONL)
#   bench/label-benchmark.sh 100000          another size
# Environment: BENCH_CORPORA (default bench/corpora, git-ignored; listings-N.jsonl there is reused),
# BENCH_CORPUS (a JSONL file to use instead), BENCH_HARVEST (the folder of its harvest, default beside the corpus), BENCH_HEAP (default -Xmx4g: the corpus is held in memory so
# that every pass reads the same listings), BENCH_ARGS (more LabelBenchmark options, e.g.
# "--regex-sample 2000 --threads 2"). See bench/README-label.md.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
N="${1:-1000000}"
CORPORA="${BENCH_CORPORA:-$ROOT/bench/corpora}"
CORPUS="${BENCH_CORPUS:-$CORPORA/listings-$N.jsonl}"
HEAP="${BENCH_HEAP:--Xmx4g}"
WORK="$(mktemp -d "${TMPDIR:-/tmp}/sheaf-label-bench.XXXXXX")"
trap 'rm -rf "$WORK"' EXIT

die() { echo "label-benchmark: $*" >&2; exit 1; }
[ -x /usr/bin/time ] || die "/usr/bin/time is needed for peak memory (apt-get install time)"

. "$ROOT/bench/lib.sh"
bench_classpath miner

if [ ! -s "$CORPUS" ]; then
  mkdir -p "$(dirname "$CORPUS")"
  if "$ROOT/sheaf" generate --help 2>/dev/null | grep -q -- "--listings"; then
    echo "label-benchmark: generating $CORPUS with ./sheaf generate (seed 42) ..." >&2
    "$ROOT/sheaf" generate --listings "$N" --format jsonl --out "$CORPUS" --seed 42 >&2
  else
    echo "label-benchmark: ./sheaf generate is not built here; writing a synthetic corpus of the same JSONL shape ..." >&2
    java -cp "$CP" dev.sheaf.miner.label.LabelBenchmark --synthetic "$N" --out "$CORPUS"
  fi
fi

# the vocabulary comes from the corpus's harvest (issue 5): sheaf mine, every candidate kept, cached beside the corpus
HARVEST="${BENCH_HARVEST:-${CORPUS%.jsonl}.harvest}"
if [ ! -s "$HARVEST/harvest.json" ] || [ "$HARVEST/harvest.json" -ot "$CORPUS" ]; then
  echo "label-benchmark: mining $CORPUS into $HARVEST (sheaf mine --limit 0) ..." >&2
  "$ROOT/sheaf" mine "$CORPUS" --limit 0 --no-progress --out "$HARVEST" >"$WORK/mine.log" 2>&1 \
    || { tail -n 20 "$WORK/mine.log" >&2; die "sheaf mine failed"; }
fi

# shellcheck disable=SC2086
/usr/bin/time -f "%e %M %U %S" -o "$WORK/time" java "$HEAP" -cp "$CP" dev.sheaf.miner.label.LabelBenchmark \
    --corpus "$CORPUS" --harvest "$HARVEST/harvest.json" ${BENCH_ARGS:-}
read -r wall rss user sys < <(tail -n 1 "$WORK/time")
awk -v w="$wall" -v r="$rss" -v u="$user" -v s="$sys" \
  'BEGIN { printf "whole run   %.1f s wall, %.1f CPU s, peak RSS %.0f MB (/usr/bin/time; the corpus is held in memory)\n", w, u+s, r/1024 }'
