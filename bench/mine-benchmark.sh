#!/usr/bin/env bash
# Times `sheaf mine` against its peers on the same generated corpora, in one run.
#   bench/mine-benchmark.sh                      sizes 10k, 100k, 1M listings (JSONL)
#   BENCH_SIZES="10000 100000" bench/mine-benchmark.sh
# Environment: BENCH_SIZES, BENCH_FORMAT (jsonl | folder), BENCH_CORPORA (default bench/corpora,
# git-ignored; an existing listings-N.jsonl or listings-N/ there is reused), BENCH_HEAP (default -Xmx2g),
# BENCH_JAVA_OPTS (extra JVM flags), BENCH_PEER_BUDGET (seconds a peer may be predicted to take before it is skipped, default 300),
# SHEAF_PYTHON (default /usr/bin/python3). See bench/README.md.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
read -r -a SIZES <<< "${BENCH_SIZES:-10000 100000 1000000}"
FORMAT="${BENCH_FORMAT:-jsonl}"
CORPORA="${BENCH_CORPORA:-$ROOT/bench/corpora}"
HEAP="${BENCH_HEAP:--Xmx2g}"
# extra JVM flags for both Java rows, added after the launcher's own (default: none, so sheaf runs as a user runs it)
read -r -a JOPTS <<< "${BENCH_JAVA_OPTS:-}"
BUDGET="${BENCH_PEER_BUDGET:-300}"
PY="${SHEAF_PYTHON:-/usr/bin/python3}"
WORK="$(mktemp -d "${TMPDIR:-/tmp}/sheaf-bench.XXXXXX")"
trap 'rm -rf "$WORK"' EXIT
mkdir -p "$CORPORA"

die() { echo "mine-benchmark: $*" >&2; exit 1; }
[ -x /usr/bin/time ] || die "/usr/bin/time is needed for peak memory (apt-get install time)"

. "$ROOT/bench/lib.sh"
bench_classpath miner
# the analysis-only row runs with the JVM flags the launcher gives `sheaf mine` on the same input
# (they depend on its size: the quick compiler only below 100 MB), so both Java rows compare alike
launcher_opts() { SHEAF_JAVA_OPTS= SHEAF_JAVA_EXTRA= SHEAF_SHOW_JAVA_OPTS=1 "$ROOT/sheaf" mine "$1"; }

HAVE_NLTK=0; "$PY" -c "import nltk.collocations" 2>/dev/null && HAVE_NLTK=1
HAVE_SKLEARN=0; "$PY" -c "import sklearn.feature_extraction.text" 2>/dev/null && HAVE_SKLEARN=1

corpus() { # size -> path of the corpus, generated when missing
  local n="$1" f
  if [ "$FORMAT" = folder ]; then f="$CORPORA/listings-$n"; else f="$CORPORA/listings-$n.jsonl"; fi
  if [ ! -e "$f" ]; then
    echo "mine-benchmark: generating $f ..." >&2
    "$ROOT/sheaf" generate --listings "$n" --format "$FORMAT" --out "$f" --seed 42 >&2 \
      || die "cannot generate $f with ./sheaf generate; put a corpus there yourself or set BENCH_CORPORA"
  fi
  echo "$f"
}

# sheaf mine is timed as a user's repeat run: one untimed warm-up run on a small slice of the first
# corpus lets the launcher build what is stale and record its class-data archive (see ./sheaf)
warmup() {
  local f="$1" w="$WORK/warm"
  rm -rf "$w"; mkdir -p "$w"
  if [ -d "$f" ]; then
    local files; mapfile -t files < <(find "$f" -type f | sort | head -n 200) # not a pipeline: head's early exit is no failure
    cp "${files[@]}" "$w/"
  else
    head -n 1000 "$f" > "$w/warm.jsonl"
  fi
  echo "mine-benchmark: warm-up run of ./sheaf mine (builds if stale, records the class-data archive) ..." >&2
  "$ROOT/sheaf" mine "$w" --out "$WORK/warm-out" --no-progress >"$WORK/warm.log" 2>&1 \
    || { tail -n 20 "$WORK/warm.log" >&2; die "the warm-up run of ./sheaf mine failed"; }
  rm -rf "$w" "$WORK/warm-out"
}

declare -A WALL
printf '%-9s %-24s %9s %9s %12s %9s %8s %s\n' listings tool wall_s MB/s listings/s RSS_MB cpu_s note
measure() { # key size bytes label cmd... ; records WALL[key:size]
  local key="$1" size="$2" bytes="$3" label="$4"; shift 4
  if ! /usr/bin/time -f "%e %M %U %S" -o "$WORK/time" "$@" >"$WORK/run.log" 2>&1; then
    printf '%-9s %-24s %s\n' "$size" "$label" "FAILED (last lines below)"; tail -n 5 "$WORK/run.log" | sed 's/^/    /'
    return 0
  fi
  local wall rss user sys
  read -r wall rss user sys < <(tail -n 1 "$WORK/time")
  WALL["$key:$size"]="$wall"
  awk -v n="$size" -v l="$label" -v w="$wall" -v r="$rss" -v u="$user" -v s="$sys" -v b="$bytes" -v note="${NOTE:-}" \
    'BEGIN { w2 = (w < 0.01 ? 0.01 : w); printf "%-9s %-24s %9.2f %9.1f %12.0f %9.0f %8.1f %s\n", n, l, w, b/1e6/w2, n/w2, r/1024, u+s, note }'
}

skip_peer() { # key size -> 0 when it should be skipped (prints why)
  local key="$1" size="$2" prev=0 best=""
  for s in "${SIZES[@]}"; do
    if [ "$s" -lt "$size" ] && [ -n "${WALL[$key:$s]:-}" ]; then best="$s"; fi
  done
  [ -z "$best" ] && return 1
  prev="${WALL[$key:$best]}"
  local est; est=$(awk -v p="$prev" -v a="$best" -v b="$size" 'BEGIN { printf "%.0f", p * b / a }')
  if [ "$est" -gt "$BUDGET" ]; then
    printf '%-9s %-24s %s\n' "$size" "$key" "skipped: predicted ${est} s from the ${best}-listing run (> ${BUDGET} s)"
    return 0
  fi
  return 1
}

WARM=0
for n in "${SIZES[@]}"; do
  f="$(corpus "$n")"
  if [ "$WARM" = 0 ]; then warmup "$f"; WARM=1; fi
  if [ -d "$f" ]; then bytes=$(du -sb "$f" | cut -f1); else bytes=$(stat -L -c %s "$f"); fi
  read -r -a LOPTS <<< "$(launcher_opts "$f")"
  echo "$n: JVM flags of the Java rows: ${LOPTS[*]}" >&2
  # 1. floor: read every byte once (also warms the page cache for everyone after it)
  if [ -d "$f" ]; then
    measure read "$n" "$bytes" "read every byte (cat)" sh -c "find '$f' -type f -exec cat {} + > /dev/null"
  else
    measure read "$n" "$bytes" "read every byte (cat)" sh -c "cat '$f' > /dev/null"
  fi
  # 2. the Java floors on the same reading thread and workers: reading only, Lucene's tokenizer
  #    alone, and the profile's whole analysis chain (the miner's first pass without counting)
  if [ "$FORMAT" = jsonl ]; then
    measure readonly "$n" "$bytes" "read+parse only (Java)" java "${LOPTS[@]}" "$HEAP" ${JOPTS[@]+"${JOPTS[@]}"} -cp "$CP" dev.sheaf.miner.bench.BenchMain read-only "$f"
    measure tokenizer "$n" "$bytes" "tokenizer only (Java)" java "${LOPTS[@]}" "$HEAP" ${JOPTS[@]+"${JOPTS[@]}"} -cp "$CP" dev.sheaf.miner.bench.BenchMain tokenizer-only "$f"
    measure analysis "$n" "$bytes" "analysis only (Java)" java "${LOPTS[@]}" "$HEAP" ${JOPTS[@]+"${JOPTS[@]}"} -cp "$CP" dev.sheaf.miner.bench.BenchMain analysis-only "$f"
  fi
  # 3. the whole job
  NOTE="./sheaf mine" measure sheaf "$n" "$bytes" "sheaf mine" env SHEAF_JAVA_EXTRA="$HEAP ${BENCH_JAVA_OPTS:-}" "$ROOT/sheaf" mine "$f" --out "$WORK/out-$n" --no-progress
  # 4. peers (JSONL only)
  if [ "$FORMAT" = jsonl ]; then
    if [ "$HAVE_NLTK" = 1 ]; then
      skip_peer nltk "$n" || measure nltk "$n" "$bytes" "NLTK bigrams PMI+LLR" "$PY" "$ROOT/bench/peers/nltk_bigrams.py" "$f" "$WORK/nltk-$n.tsv"
    else
      printf '%-9s %-24s %s\n' "$n" "NLTK" "skipped: python3-nltk missing"
    fi
    if [ "$HAVE_SKLEARN" = 1 ]; then
      skip_peer sklearn "$n" || measure sklearn "$n" "$bytes" "CountVectorizer(1,3)+PMI" "$PY" "$ROOT/bench/peers/sklearn_ngrams.py" "$f" "$WORK/sklearn-$n.tsv"
    else
      printf '%-9s %-24s %s\n' "$n" "CountVectorizer" "skipped: python3-sklearn missing"
    fi
  fi
  rm -rf "$WORK/out-$n"
done

echo
echo "ratios (how many times faster sheaf mine is; analysis: sheaf mine wall / analysis-only wall):"
for n in "${SIZES[@]}"; do
  s="${WALL[sheaf:$n]:-}"; [ -z "$s" ] && continue
  for peer in nltk sklearn; do
    p="${WALL[$peer:$n]:-}"
    [ -n "$p" ] && awk -v n="$n" -v peer="$peer" -v s="$s" -v p="$p" 'BEGIN { printf "  %-9s vs %-8s %7.1fx\n", n, peer, p / (s < 0.01 ? 0.01 : s) }'
  done
  a="${WALL[analysis:$n]:-}"
  [ -n "$a" ] && awk -v n="$n" -v s="$s" -v a="$a" 'BEGIN { printf "  %-9s mine/analysis-only %5.2f\n", n, s / (a < 0.01 ? 0.01 : a) }'
done
echo
echo "targets: 100k: >= 10x NLTK and >= 5x CountVectorizer throughput; 1M: <= 45 s wall with $HEAP and <= 3x analysis-only"
verdict() { if awk "BEGIN { exit !($1) }"; then echo "  PASS  $2"; else echo "  MISS  $2"; fi; }
if [ -n "${WALL[sheaf:100000]:-}" ]; then
  [ -n "${WALL[nltk:100000]:-}" ] && verdict "${WALL[nltk:100000]} >= 10 * ${WALL[sheaf:100000]}" "100k: sheaf ${WALL[sheaf:100000]} s vs NLTK ${WALL[nltk:100000]} s"
  [ -n "${WALL[sklearn:100000]:-}" ] && verdict "${WALL[sklearn:100000]} >= 5 * ${WALL[sheaf:100000]}" "100k: sheaf ${WALL[sheaf:100000]} s vs CountVectorizer ${WALL[sklearn:100000]} s"
  # how much of the NLTK budget the floors alone use (JVM start included in each)
  if [ -n "${WALL[nltk:100000]:-}" ]; then
    for fl in readonly tokenizer analysis; do
      v="${WALL[$fl:100000]:-}"
      [ -n "$v" ] && awk -v f="$fl" -v v="$v" -v p="${WALL[nltk:100000]}" \
        'BEGIN { printf "        100k floor %-10s %6.2f s = %5.1f%% of the 10x-NLTK budget (%.2f s)\n", f, v, 100 * v / (p / 10), p / 10 }'
    done
  fi
fi
if [ -n "${WALL[sheaf:1000000]:-}" ]; then
  verdict "${WALL[sheaf:1000000]} <= 45" "1M: sheaf ${WALL[sheaf:1000000]} s wall"
  [ -n "${WALL[analysis:1000000]:-}" ] && verdict "${WALL[sheaf:1000000]} <= 3 * ${WALL[analysis:1000000]}" "1M: sheaf ${WALL[sheaf:1000000]} s vs analysis only ${WALL[analysis:1000000]} s"
fi
echo "load average during the run: $(cut -d' ' -f1-3 /proc/loadavg) on $(nproc) cores (peers and sheaf share the machine with whatever else runs)"
