#!/usr/bin/env bash
# The README's main-job command: install what is missing, build, load the demo archipelago into a
# project file and print every analysis atollog has so far.
set -euo pipefail
cd "$(dirname "$0")/.."

bash .ci/install-deps
cmake --preset default >/dev/null
cmake --build --preset default -j "$(nproc)" --target atollog atollog-view

atollog=build/app/atollog
project=build/demo.atollog
rm -f "$project" "$project-wal" "$project-shm"

run() { echo; echo "\$ atollog $*"; "$atollog" "$@"; }

run import "$project" cores-demo/archipelago
# check exits 1 when it reports anything; the demo carries a few deliberate warnings.
run check "$project" || [ $? -eq 1 ]
run show "$project"
# Biostratigraphy: observed ranges, datum picks (stored as tie points), zones and conflicts.
run ranges "$project"
run datums "$project" --extend 0.95
run zones "$project"
run zones "$project" --by conflict
for hole in KAL1 TOR1 OSS1 PEL1; do
    run chart "$project" --hole "$hole" --extend 0.95 --out "build/demo-range-chart-$hole.png"
done
run chart "$project" --hole TOR1 --extend 0.95 --out build/demo-range-chart-TOR1.svg
run chart "$project" --hole TOR1 --extend 0.95 --page a4 --out build/demo-range-chart-TOR1.pdf
# Numerical dates (U-Th from activity ratios, radiocarbon calibrated) and the chain's migration.
run dates "$project"
run chain "$project"
run chain "$project" --plot build/demo-chain.png >/dev/null
# Age-depth models (stored with their seed), accretion rates and subsidence. Ties over the 95 %
# range-extended brackets; the collars stand on emerged reef flats, so the core top is open
# (no younger than today, no older than the shallowest tie).
model=(--extend 0.95 --ties-extended --core-top-open)
run age "$project" "${model[@]}"
run age "$project" "${model[@]}" --by hiatus
for hole in KAL1 TOR1 OSS1 PEL1; do
    run age "$project" "${model[@]}" --hole "$hole" --plot "build/demo-age-depth-$hole.png" >/dev/null
done
run rates "$project" "${model[@]}" --porosity-law 0.5,2000
for along in depth age; do
    run rates "$project" "${model[@]}" --hole TOR1 --plot "build/demo-rates-$along-TOR1.png" \
        --plot-along "$along" >/dev/null
done
run subsidence "$project" "${model[@]}" --per-hole
run subsidence "$project" "${model[@]}" --plot build/demo-subsidence.png >/dev/null
run subsidence "$project" "${model[@]}" --hole PEL1 --plate-age-ma 60
# Correlation between holes: contradictions, the composite sequence (stored with its seed), a
# line of correlation, isochrons and an event's tie line.
run order "$project"
run sequence "$project" --seed 730117
run sequence "$project" --seed 730117 --by extension --no-store
run line "$project" --hole OSS1 --with PEL1
run line "$project" --hole OSS1 --with PEL1 --plot build/demo-line-OSS1-PEL1.png >/dev/null
run line "$project" --hole OSS1 --with PEL1 --by segment
run line "$project" --hole PEL1 --composite --by segment
run isochrons "$project" "${model[@]}" --ages-ma 0.125,0.45,1.0 --events "B CONV-MIN"
# The correlation panel: columns with lanes of three taxa whose events are tied, the larger
# benthic foraminifera zones and an age track (dates, age model), tie lines and isochrons, as the
# viewer shows it.
run panel "$project" "${model[@]}" --out build/demo-panel.png --scale 1000 \
    --events "B CONV-MIN,T LEPT-TEN,B OPKA-GRA" --ages-ma 0.125,1.0 \
    --taxa CONV-MIN,LEPT-TEN,OPKA-GRA \
    --tracks runs,lithology,surfaces,samples,taxa,zones,dates,model \
    --zone-scheme "VL larger benthic foraminifera"
# The same holes on an age axis: each column through its age model, so equal ages stand level and
# the time of each exposure surface opens as a grey gap.
run panel "$project" "${model[@]}" --out build/demo-panel-age.png --scale 1000 \
    --events "B CONV-MIN,T LEPT-TEN,B OPKA-GRA" --ages-ma 0.125,1.0 \
    --tracks runs,lithology,surfaces,samples,dates,model --axis age
run panel "$project" "${model[@]}" --out build/demo-panel-flat.svg --scale 1000 \
    --events "B CONV-MIN,T LEPT-TEN,B OPKA-GRA" --axis elevation --flatten "T LEPT-TEN"
run history "$project"
echo
echo "The same panel in a window: build/app/atollog-view $project"
