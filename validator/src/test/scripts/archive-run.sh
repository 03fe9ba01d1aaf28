#!/bin/sh
# The archive figure: re-check a folder of N generated formulation documents in one run, in a 256 MiB heap.
# Usage: validator/src/test/scripts/archive-run.sh [N]   (after mvn -q package; default N = 10000)
# The documents are variants of one sample with the amounts scaled; nothing is kept afterwards.
set -eu
n=${1:-10000}
root=$(cd "$(dirname "$0")/../../../.." && pwd)
jar="$root/validator/target/protolyte.jar"
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
mkdir "$work/archive"
template="$root/sample-formulations/parenteral-citrate-buffer-off-target.json"
i=0
while [ "$i" -lt "$n" ]; do
  grams=$(printf '%d.%02d' $((3 + i % 3)) $((i % 97)))
  sed -e "s/\"LB-DP-0225\"/\"ARCH-$i\"/" -e "s/\"4.41 g\"/\"$grams g\"/" "$template" > "$work/archive/doc-$i.json"
  i=$((i + 1))
done
start=$(date +%s.%N)
# C1 only: on two cores the optimising compiler's own work costs more than it saves in a run of seconds
# (measured: 13.5 s with the default tiered compilation, 7.7 s with -XX:TieredStopAtLevel=1, same report).
java -Xmx256m -XX:TieredStopAtLevel=1 -jar "$jar" check --format json -o "$work/report.json" "$work/archive" || true
end=$(date +%s.%N)
size=$(wc -c < "$work/report.json")
echo "$n documents in $(echo "$end - $start" | bc) s with -Xmx256m -XX:TieredStopAtLevel=1; report $size bytes"
