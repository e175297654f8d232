#!/usr/bin/env bash
# Peak resident memory of the 10^6-row jobs (GNU time's maximum resident set size), through the
# launcher as users run them: sequence --steps 10^6 --out, polytrope --points 10^6 --out, and an
# audit of a 10^6-row profile (made by scripts/million_row_profile.py from the polytrope's
# output). Goal: each under 1 GB. Needs /usr/bin/time and Debian's python3-numpy.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
launcher="$here/../../stellabar"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
"$launcher" --version >/dev/null 2>&1   # build the jar and the start-up archive first
measure() {
  local name="$1"; shift
  /usr/bin/time -f "%M %e" -o "$work/time" "$launcher" "$@" >/dev/null 2>"$work/err" || { cat "$work/err" >&2; exit 1; }
  read -r kb seconds < "$work/time"
  printf '| %s | %d MB | %s s |\n' "$name" $((kb / 1024)) "$seconds"
}
echo "| job | peak resident | wall |"
echo "| --- | --- | --- |"
measure "sequence --steps 1000000 --out" sequence --steps 1000000 --out "$work/sequence"
measure "polytrope --index 3 --points 1000000 --out" polytrope --index 3 --points 1000000 --out "$work/polytrope"
/usr/bin/python3 "$here/scripts/million_row_profile.py" "$work/polytrope/polytrope-n3-profile.csv" "$work/million.csv"
measure "audit of a 10^6-row CSV profile --out" audit "$work/million.csv" --out "$work/audit"
