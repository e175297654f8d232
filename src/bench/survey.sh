#!/usr/bin/env bash
# Survey benchmarks (issue: surveys on one machine or a Slurm cluster), run with the launcher as
# users run it:
#   1. cores: a 20 x 20 survey of standard models (400 models) on 1 core and on 2 cores
#      (-XX:ActiveProcessorCount), medians of ROUNDS runs, alternating, and the speed-up;
#   2. merge: 4 parts of a 1000 x 1000 survey (10^6 rows), made by merge_parts.py from one real
#      part (its rows repeated with their point numbers), merged into FITS alone and into the
#      default CSV, ECSV, FITS and JSON, without maps, median of ROUNDS.
# Usage: bash src/bench/survey.sh [ROUNDS]   (default 3)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$(cd "$here/../.." && pwd)"
rounds="${1:-3}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
stellabar="$root/stellabar"
"$stellabar" --version >/dev/null

cat > "$work/cores.toml" <<'TOML'
[survey]
name = "cores"
kind = "standard"
chart_formats = []
table_formats = ["csv"]
[survey.axes.mass]
from = "1 Msun"
to = "1e5 Msun"
count = 20
[survey.axes.radius]
from = "10 Rsun"
to = "1e4 Rsun"
count = 20
TOML

seconds() { local s e; s=$(date +%s.%N); "$@" >/dev/null 2>&1; e=$(date +%s.%N); echo "$e - $s" | bc -l; }
median() { sort -g | awk '{a[NR]=$1} END {print a[int((NR+1)/2)]}'; }

one=(); two=()
for ((r = 0; r < rounds; r++)); do
  one+=("$(STELLABAR_JAVA_OPTS=-XX:ActiveProcessorCount=1 seconds "$stellabar" survey "$work/cores.toml" -o "$work/c1" -q)")
  two+=("$(STELLABAR_JAVA_OPTS=-XX:ActiveProcessorCount=2 seconds "$stellabar" survey "$work/cores.toml" -o "$work/c2" -q)")
done
m1=$(printf '%s\n' "${one[@]}" | median)
m2=$(printf '%s\n' "${two[@]}" | median)
printf '400 standard models: 1 core %.2f s, 2 cores %.2f s, speed-up %.2f (goal >= 1.8)\n' "$m1" "$m2" \
  "$(echo "$m1 / $m2" | bc -l)"

for formats in '["fits"]' '["csv", "ecsv", "fits", "json"]'; do
  rm -rf "$work/big"
  python3 "$here/scripts/merge_parts.py" "$stellabar" "$work/big" "$formats" >/dev/null
  merge=()
  for ((r = 0; r < rounds; r++)); do
    rm -rf "$work/merged"
    merge+=("$(seconds "$stellabar" merge "$work/big/parts" -o "$work/merged" -q)")
  done
  printf 'merge of 10^6 rows (4 parts) into %s, no maps: %.2f s (goal < 5 s)\n' "$formats" \
    "$(printf '%s\n' "${merge[@]}" | median)"
done
