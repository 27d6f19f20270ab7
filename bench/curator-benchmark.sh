#!/usr/bin/env bash
# How quickly the desktop curator opens a large workspace and filters its harvest, in one run:
# 20,000 candidates mined from 100,000 generated listings and a 5,000-concept vocabulary.
#   bench/curator-benchmark.sh            model-level and window (headless Monocle) figures
# Environment: BENCH_CORPORA (default bench/corpora, git-ignored; the corpus and the workspace are
# reused), BENCH_HEAP (default -Xmx2g), BENCH_LISTINGS (default 100000), BENCH_CANDIDATES (default 20000).
# Prints open time (target < 2 s once the harvest exists) and per-keystroke filter time (target < 100 ms)
# beside the floors (reading the files alone, a plain loop over the same strings), then peak RSS.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
N="${BENCH_LISTINGS:-100000}"
CANDS="${BENCH_CANDIDATES:-20000}"
CORPORA="${BENCH_CORPORA:-$ROOT/bench/corpora}"
CORPUS="$CORPORA/listings-$N.jsonl"
WS="$CORPORA/curator-ws-$N"
HEAP="${BENCH_HEAP:--Xmx2g}"
WORK="$(mktemp -d "${TMPDIR:-/tmp}/sheaf-curator-bench.XXXXXX")"
trap 'rm -rf "$WORK"' EXIT
die() { echo "curator-benchmark: $*" >&2; exit 1; }
[ -x /usr/bin/time ] || die "/usr/bin/time is needed for peak memory (apt-get install time)"

. "$ROOT/bench/lib.sh"
bench_classpath curator-ui miner

mkdir -p "$CORPORA"
if [ ! -s "$CORPUS" ]; then
  echo "curator-benchmark: generating $CORPUS (seed 42) ..." >&2
  "$ROOT/sheaf" generate --listings "$N" --format jsonl --out "$CORPUS" --seed 42 >&2
fi
if [ ! -s "$WS/out/harvest.json" ]; then
  mkdir -p "$WS"
  ln -sf "$CORPUS" "$WS/listings.jsonl"
  cat > "$WS/workspace.json" <<JSON
{"format": "sheaf-workspace", "formatVersion": 1, "name": "Curator benchmark",
 "sources": [{"path": "listings.jsonl"}], "profile": "default", "vocabulary": "bench.vocab.json", "output": "out"}
JSON
  echo "curator-benchmark: mining $N listings into $WS (up to $CANDS candidates) ..." >&2
  "$ROOT/sheaf" mine --workspace "$WS" --limit "$CANDS" --no-progress >&2
fi
rm -f "$WS"/bench.vocab.json.journal* 2>/dev/null || true

/usr/bin/time -f "%e %M %U %S" -o "$WORK/time" java "$HEAP" \
    -Dglass.platform=Monocle -Dmonocle.platform=Headless -Dprism.order=sw -Dheadless.geometry=1440x900-32 \
    -cp "$CP" dev.sheaf.curator.bench.CuratorBenchmark "$WS" --ui 2>"$WORK/err" || { cat "$WORK/err" >&2; die "the benchmark failed"; }
grep -v 'Unsupported JavaFX configuration\|PlatformImpl startup' "$WORK/err" >&2 || true
read -r wall rss user sys < <(tail -n 1 "$WORK/time")
awk -v w="$wall" -v r="$rss" -v u="$user" -v s="$sys" \
  'BEGIN { printf "whole run   %.1f s wall, %.1f CPU s, peak RSS %.0f MB (/usr/bin/time)\n", w, u+s, r/1024 }'
echo "load average: $(cut -d' ' -f1-3 /proc/loadavg) on $(nproc) cores (timings on a loaded machine are inflated)"
