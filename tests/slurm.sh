#!/usr/bin/env bash
# A real Slurm run of a spread study: starts a one-node cluster from Debian's packages (munge, slurmctld, slurmd;
# needs root and apt-get), writes the job scripts with `leveldesign spread --slurm 4`, submits the 4-task array and
# the dependent merge, waits, and compares the merged study with an unsharded run of the same study (byte for byte
# apart from the timing fields); then the same for a 61-point sweep and a 5×9 grid sweep (byte for byte). Stops the daemons it started by their PIDs. Exit 0 passed, 1 failed; prints
# "skipped: REASON" and exits 0 only when Slurm cannot be started here.
set -uo pipefail
cd "$(dirname "$0")/.."
root=$(pwd)
skip() { echo "skipped: $*"; exit 0; }

[ "$(id -u)" = 0 ] || skip "needs root to start slurmctld, slurmd and munged"
if ! command -v slurmctld >/dev/null || ! command -v slurmd >/dev/null || ! command -v munged >/dev/null || ! command -v sbatch >/dev/null; then
  command -v apt-get >/dev/null || skip "Slurm is not installed and apt-get is not available"
  { apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq slurmctld slurmd slurm-client munge; } </dev/null >/dev/null 2>&1 \
    || skip "could not install slurmctld slurmd slurm-client munge"
fi

work=$(mktemp -d /tmp/ld-slurm.XXXXXX)
pids=()
cleanup() {
  for p in "${pids[@]}"; do kill "$p" 2>/dev/null; done
  for p in "${pids[@]}"; do wait "$p" 2>/dev/null; done
  rm -rf "$work"
}
trap cleanup EXIT

# munge: a fresh key unless one exists; munged in the foreground, owned by us through its PID
if [ ! -s /etc/munge/munge.key ]; then
  mkdir -p /etc/munge && head -c 1024 /dev/urandom > /etc/munge/munge.key
  chown munge:munge /etc/munge/munge.key && chmod 400 /etc/munge/munge.key
fi
mkdir -p /run/munge /var/log/munge /var/lib/munge && chown munge:munge /run/munge /var/log/munge /var/lib/munge
# setpriv execs munged itself (runuser would stay as its parent), so the PID below is munged's own
setpriv --reuid=munge --regid=munge --init-groups /usr/sbin/munged --force --foreground >"$work/munged.log" 2>&1 &
pids+=($!)

host=$(hostname)
mkdir -p /etc/slurm /var/spool/slurmctld /var/spool/slurmd
if [ -e /etc/slurm/slurm.conf ] && ! grep -q '^# written by LevelDesign tests/slurm.sh' /etc/slurm/slurm.conf; then
  skip "/etc/slurm/slurm.conf exists and was not written by this script; not touching a real cluster's configuration"
fi
cat > /etc/slurm/slurm.conf <<CONF
# written by LevelDesign tests/slurm.sh
ClusterName=ldtest
SlurmctldHost=$host
SlurmUser=root
AuthType=auth/munge
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SelectType=select/cons_tres
SelectTypeParameters=CR_Core_Memory
StateSaveLocation=/var/spool/slurmctld
SlurmdSpoolDir=/var/spool/slurmd
ReturnToService=2
MpiDefault=none
AccountingStorageType=accounting_storage/none
JobCompType=jobcomp/none
NodeName=$host CPUs=$(nproc) RealMemory=$(( $(awk '/MemTotal/ {print int($2/1024)}' /proc/meminfo) - 512 )) State=UNKNOWN
PartitionName=main Nodes=$host Default=YES MaxTime=INFINITE State=UP
CONF
sleep 1
slurmctld -D >"$work/slurmctld.log" 2>&1 &
pids+=($!)
slurmd -D >"$work/slurmd.log" 2>&1 &
pids+=($!)
up=0
for _ in $(seq 1 60); do
  if sinfo -h -o '%T' 2>/dev/null | grep -qE '^(idle|mixed|allocated)'; then up=1; break; fi
  sleep 1
done
[ "$up" = 1 ] || { tail -n 5 "$work"/*.log >&2; skip "the Slurm node did not come up within 60 s"; }

# the study: the demo spread device, 12 samples, the idle-point rules (seconds per sample)
exe="$root/src/LevelDesign/bin/Debug/net10.0/leveldesign"
[ -x "$exe" ] || { echo "FAILED: build the solution first ($exe missing)"; exit 1; }
device="$root/devices/pair-spread.toml"
rules=(--samples 12 --rule "detuned=qa.f01 - qb.f01 > 300 MHz at idle" --rule "quiet=zz:qa:qb within 60 kHz at idle")
"$exe" spread "$device" "${rules[@]}" --slurm 4 --threads 1 --out "$work/cluster" </dev/null || { echo "FAILED: writing the job scripts"; exit 1; }
submitted=$(bash "$work/cluster/submit.sh") || { echo "FAILED: submitting: $submitted"; exit 1; }
echo "$submitted"
merge=$(sed -n 's/.*merge job \([0-9]*\).*/\1/p' <<<"$submitted")
done_=0
for _ in $(seq 1 600); do
  if ! squeue -h 2>/dev/null | grep -q .; then done_=1; break; fi
  sleep 1
done
[ "$done_" = 1 ] || { echo "FAILED: jobs still queued after 600 s"; squeue; exit 1; }
[ -s "$work/cluster/spread.json" ] || { echo "FAILED: the merge job $merge wrote no spread.json"; cat "$work/cluster/logs/"* >&2; exit 1; }

mkdir -p "$work/single"
"$exe" spread "$device" "${rules[@]}" --threads 2 --out "$work/single" >"$work/single/summary.txt" </dev/null || { echo "FAILED: unsharded run"; exit 1; }
strip() { sed -E 's/"(started|elapsed_seconds)": [^,]*/"\1": T/' "$1"; }
status=0
for f in "$work/single"/*; do
  name=$(basename "$f")
  if [[ $name == *.json ]]; then
    cmp -s <(strip "$f") <(strip "$work/cluster/$name") || { echo "FAILED: $name differs between the Slurm run and the unsharded run"; status=1; }
  else
    cmp -s "$f" "$work/cluster/$name" || { echo "FAILED: $name differs between the Slurm run and the unsharded run"; status=1; }
  fi
done
[ "$status" = 0 ] && echo "slurm: 4-task array + dependent merge equals the unsharded study ($(ls "$work/single" | wc -l) files compared)"

# the same for a sweep: the demo's 61-point coupler scan in 4 shards, merged, against one unsharded run
"$exe" sweep "$root/devices/pair.toml" --sweep coupler_scan --json --slurm 4 --out "$work/sweep" </dev/null 2>/dev/null || { echo "FAILED: writing the sweep's job scripts"; exit 1; }
bash "$work/sweep/submit.sh" || { echo "FAILED: submitting the sweep"; exit 1; }
for _ in $(seq 1 600); do squeue -h 2>/dev/null | grep -q . || break; sleep 1; done
"$exe" sweep "$root/devices/pair.toml" --sweep coupler_scan --json --out "$work/sweep-single.json" </dev/null 2>/dev/null || { echo "FAILED: unsharded sweep"; exit 1; }
if cmp -s "$work/sweep/sweep.json" "$work/sweep-single.json"; then
  echo "slurm: 4-task sweep array + dependent merge equals the unsharded sweep byte for byte"
else
  echo "FAILED: the merged sweep differs from the unsharded one"; cat "$work/sweep/logs/"*.err >&2 2>/dev/null; status=1
fi

# a grid: 5 coupler-current rows × 9 qubit-flux points in 4 tasks (split by rows), merged, against one unsharded run
grid_start=$SECONDS
grid=(--vary "qc_flux=0.15mA:1.05mA:5" --vary "qa_flux=0:0.3:9" --csv)
"$exe" sweep "$root/devices/pair.toml" "${grid[@]}" --slurm 4 --out "$work/grid" </dev/null 2>/dev/null || { echo "FAILED: writing the grid's job scripts"; exit 1; }
bash "$work/grid/submit.sh" || { echo "FAILED: submitting the grid"; exit 1; }
for _ in $(seq 1 600); do squeue -h 2>/dev/null | grep -q . || break; sleep 1; done
"$exe" sweep "$root/devices/pair.toml" "${grid[@]}" --out "$work/grid-single.csv" </dev/null 2>/dev/null || { echo "FAILED: unsharded grid"; exit 1; }
if [ -s "$work/grid/sweep.csv" ] && cmp -s "$work/grid/sweep.csv" "$work/grid-single.csv"; then
  echo "slurm: 4-task 5×9 grid array + dependent merge equals the unsharded grid byte for byte ($((SECONDS - grid_start)) s)"
else
  echo "FAILED: the merged grid differs from the unsharded one (or was not written)"; cat "$work/grid/logs/"*.err >&2 2>/dev/null; status=1
fi
exit "$status"
