#!/usr/bin/env bash
# Writes tests/reference/data/pair_describe.json: `leveldesign describe --json` of devices/pair.toml at several
# coupler biases, with the bias mapping, for zz_zero_pair.py. Run from the repository root after a build:
#   bash tests/reference/make_pair_describe.sh [path/to/leveldesign.dll]
set -euo pipefail
dll="${1:-src/LevelDesign/bin/Debug/net10.0/leveldesign.dll}"
tmp="$(mktemp -d)"
trap 'rm -rf "$tmp"' EXIT
biases=(0.15 0.45 0.6 0.7 0.75 0.8 0.9 1.05)
for b in "${biases[@]}"; do
  dotnet "$dll" describe devices/pair.toml --json --at "qc_flux=${b}mA" > "$tmp/$b.json"
done
/usr/bin/python3 - "$tmp" "${biases[@]}" <<'PY'
import json, sys
tmp, biases = sys.argv[1], sys.argv[2:]
out = {
    "generated_by": "tests/reference/make_pair_describe.sh: leveldesign describe devices/pair.toml --json --at qc_flux=<b>mA",
    "bias": {"name": "qc_flux", "target": "qc.flux", "unit": "A", "period": 0.0024, "offset": 0.00015,
             "mapping": "qc.flux = (value - offset) / period (from devices/pair.toml)"},
    "describes": [dict(control_a=float(b) * 1e-3, describe=json.load(open(f"{tmp}/{b}.json"))) for b in biases],
}
with open("tests/reference/data/pair_describe.json", "w") as f:
    json.dump(out, f, indent=1, ensure_ascii=False)
    f.write("\n")
PY
echo "wrote tests/reference/data/pair_describe.json"
