#!/usr/bin/env bash
# Writes the --json output (and exit code) of solve, audit, check, view-factors and
# sensitivity for every shipped case into DIR, one file per case and command, so that a
# restructuring can be compared with the state before it: `diff -r before after`.
# Usage: scripts/snapshot-outputs.sh DIR   (uses ./exitance, building it if needed)
# Paths of the checkout and timings are normalised, so snapshots from two checkouts compare.
set -uo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
out="${1:?usage: snapshot-outputs.sh DIR}"
mkdir -p "$out"
run() { # name, args...
  local name="$1"; shift
  "$here/exitance" "$@" >"$out/$name.out" 2>"$out/$name.err"; echo "exit $?" >>"$out/$name.out"
  # the checkout's path and wall-clock times differ between runs: normalise them
  sed -i -e "s|$here|<repo>|g" -e 's|"seconds" : [0-9.eE+-]*|"seconds" : <t>|' \
      -e 's|computed in [0-9.]* s|computed in <t> s|' "$out/$name.out" "$out/$name.err"
}
for f in "$here"/cases/demo/*.json "$here"/cases/validation/*.json; do
  b="$(basename "$(dirname "$f")")-$(basename "$f" .json)"
  run "$b.solve" solve --json "$f"
  run "$b.solve-table" solve "$f"
  run "$b.audit" audit --json "$f"
  run "$b.check" check "$f"
  run "$b.view-factors" view-factors --json "$f"
done
for f in "$here"/cases/materials/*.json; do
  run "material-$(basename "$f" .json)" material "$f"
done
run verify verify
# sensitivities of the first surface of each demo case (and a solved temperature)
run "sens-crucible-cavity" sensitivity --json --of heater_wall "$here/cases/demo/crucible-cavity.json"
run "sens-electronics-box" sensitivity --json --of board "$here/cases/demo/electronics-box.json"
run "sens-furnace-sight-window" sensitivity --json --of heater "$here/cases/demo/furnace-sight-window.json"
run "sens-heat-treating-chamber-facets" sensitivity --json --of heater "$here/cases/demo/heat-treating-chamber-facets.json"
run "sens-heat-treating-chamber-geometry" sensitivity --json --of heater "$here/cases/demo/heat-treating-chamber-geometry.json"
run "sens-heat-treating-chamber" sensitivity --json --of heater "$here/cases/demo/heat-treating-chamber.json"
run "sens-muffle-with-part-stl" sensitivity --json --of muffle "$here/cases/demo/muffle-with-part-stl.json"
run "sens-oven-cavity-obj" sensitivity --json --of element "$here/cases/demo/oven-cavity-obj.json"
run "sens-selective-absorber-audit" sensitivity --json --of emitter "$here/cases/demo/selective-absorber-audit.json"
run "sens-spacecraft-box-geometry" sensitivity --json --of plus_z_zenith --load-case sunlit "$here/cases/demo/spacecraft-box-geometry.json"
run "sens-spacecraft-box-orbit" sensitivity --json --of plus_z_sun --load-case sunlit "$here/cases/demo/spacecraft-box-orbit.json"
run "sens-selective-absorber-audit-T" sensitivity --json --of selective_plate --quantity temperature "$here/cases/demo/selective-absorber-audit.json"
