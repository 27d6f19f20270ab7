# Shared by the benchmark scripts (sourced, not run). Needs ROOT, WORK and die() set by the caller.

# bench_classpath MODULE...: builds the modules offline with their tests compiled (tests not run)
# and sets CP to their test and main classes, the vocabulary's classes and the test-scope class path.
bench_classpath() {
  local m modules
  modules=$(IFS=,; echo "$*")
  echo "$(basename "$0" .sh): building (offline, tests not run) ..." >&2
  (cd "$ROOT" && mvn -o -q -B -pl "$modules" -am test-compile dependency:build-classpath \
      -Dmdep.outputFile="$WORK/cp.txt" -Dmdep.includeScope=test) >"$WORK/build.log" 2>&1 \
    || { tail -n 30 "$WORK/build.log" >&2; die "build failed"; }
  CP=""
  for m in "$@"; do CP="$CP$ROOT/$m/target/test-classes:$ROOT/$m/target/classes:"; done
  CP="$CP$ROOT/vocab/target/classes:$(cat "$WORK/cp.txt")"
}
