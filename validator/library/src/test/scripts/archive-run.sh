#!/bin/sh
# The archive figure: re-check a folder of N formulation documents in one run, in a 256 MiB heap.
# Usage: validator/library/src/test/scripts/archive-run.sh [N]   (after mvn -q package; default N = 10000)
# The documents are copies of every shipped formulation sample in turn, each with its own id; nothing is kept.
set -eu
n=${1:-10000}
root=$(cd "$(dirname "$0")/../../../../.." && pwd)
jar="$root/validator/target/protolyte.jar"
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
mkdir "$work/archive"
set -- "$root"/sample-formulations/*.json
count=$#
i=0
while [ "$i" -lt "$n" ]; do
  k=$((i % count + 1))
  eval "template=\${$k}"
  # the first "id" of the document is its own: made unique per copy
  sed -e "0,/\"id\": *\"/s//\"id\": \"ARCH-$i-/" "$template" > "$work/archive/doc-$i.json"
  i=$((i + 1))
done
start=$(date +%s.%N)
# C1 only: on two cores the optimising compiler's own work costs more than it saves in a run of seconds
# (measured: 13.5 s with the default tiered compilation, 7.7 s with -XX:TieredStopAtLevel=1, same report).
java -Xmx256m -XX:TieredStopAtLevel=1 -jar "$jar" check --format json -o "$work/report.json" "$work/archive" || true
end=$(date +%s.%N)
size=$(wc -c < "$work/report.json")
echo "$n documents ($count samples in turn) in $(echo "$end - $start" | bc) s with -Xmx256m -XX:TieredStopAtLevel=1; report $size bytes"
