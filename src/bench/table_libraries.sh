#!/usr/bin/env bash
# Our table writers and readers against STIL's on a 10^6-row table (src/bench/TableLibraries.java):
# wall time of each job (median of 3 after a warm-up) and file sizes, as a Markdown table.
# Usage: src/bench/table_libraries.sh [ROWS]   (default 1000000; needs ~3 GB of heap)
#        TABLE_LIBRARIES_ONLY="read FITS" src/bench/table_libraries.sh   only the jobs whose name holds the text
#        TABLE_LIBRARIES_KEEP=DIR src/bench/table_libraries.sh 1000   writes each file once into DIR (no timing)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$here/../.."
cd "$root"
mvn -o -B -q compile
cp="$(mvn -o -B -q dependency:build-classpath -Dmdep.outputFile=/dev/stdout)"
java -Xmx3g ${TABLE_LIBRARIES_ONLY:+-Donly="$TABLE_LIBRARIES_ONLY"} ${TABLE_LIBRARIES_KEEP:+-Dkeep="$TABLE_LIBRARIES_KEEP"} -cp "target/classes:$cp" "$here/TableLibraries.java" "${1:-1000000}"
