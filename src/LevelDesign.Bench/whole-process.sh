#!/usr/bin/env bash
# Whole-process timings of the leveldesign executable, as a user meets them (start-up included). Benchmark only.
# Usage: src/LevelDesign.Bench/whole-process.sh LEVELDESIGN [RUNS] [--numpy]
#   LEVELDESIGN  the command to time: an installed tool (~/.dotnet/tools/leveldesign), the single file, or
#                "dotnet src/LevelDesign/bin/Release/net10.0/leveldesign.dll"
#   RUNS         runs of each measurement (default 5); medians are printed with every run and the load average
#   --numpy      also time ../shared/bench/numpy_reference_sweep.py (about 20 s a run) interleaved with the sweep
# Measures: the terminal UI's first complete screen in tmux (polls capture-pane until the key bar is drawn),
# `check devices/pair.toml`, `spectrum devices/pair.toml`, and the 201-point sweep of the reference device.
set -euo pipefail
cd "$(dirname "$0")/../.."
exe=$1 runs=${2:-5} numpy=${3:-}
bench=${BENCH_DIR:-$(cd .. && pwd)/shared/bench}
now() { date +%s.%N; }
# Median of column 1 (wall seconds) over lines "WALL [CPU]", with every run; and the median processor time if given.
mid() { sort -n | awk '{a[NR] = $1} END {if (NR) printf "%.3f", NR % 2 ? a[(NR + 1) / 2] : (a[NR / 2] + a[NR / 2 + 1]) / 2}'; }
median() {
  local lines; lines=$(cat)
  printf 'median %s s  (runs: %s)' "$(cut -d' ' -f1 <<<"$lines" | mid)" "$(cut -d' ' -f1 <<<"$lines" | xargs printf '%.3f ' | sed 's/ $//')"
  if [ -n "$(cut -s -d' ' -f2 <<<"$lines")" ]; then printf '  processor time median %s s' "$(cut -d' ' -f2 <<<"$lines" | mid)"; fi
  echo
}
load() { cut -d' ' -f1-3 /proc/loadavg; }
# "WALL CPU" seconds of one run of a command (CPU = user + system, all threads), output discarded.
wall() {
  local s e f; f=$(mktemp)
  s=$(now); /usr/bin/time -f "%U %S" -o "$f" "$@" >/dev/null 2>&1 || { echo "failed: $*" >&2; rm -f "$f"; exit 1; }; e=$(now)
  echo "$(echo "$e - $s" | bc -l) $(awk '{print $1 + $2}' "$f")"; rm -f "$f"
}

ui_once() { # seconds from launch until the key bar is on screen (100x30), or 60 on timeout
  local session="ld-bench-$$" s e i
  tmux kill-session -t "$session" 2>/dev/null || true
  s=$(now)
  tmux new-session -d -s "$session" -x 100 -y 30 "NO_COLOR=1 TERM=xterm-256color $exe devices/pair.toml; sleep 30"
  for ((i = 0; i < 3000; i++)); do
    if tmux capture-pane -t "$session" -p | grep -qF "F1 all keys"; then break; fi
    sleep 0.01
  done
  e=$(now)
  tmux kill-session -t "$session" 2>/dev/null || true
  echo "$e - $s" | bc -l
}

echo "leveldesign: $exe   runs: $runs   cores: $(nproc)   load before: $(load)"
# one untimed run of each so the file cache is warm
$exe check devices/pair.toml >/dev/null
if command -v tmux >/dev/null; then
  tmux start-server
  echo "UI first screen (key bar drawn): $(for ((r = 0; r < runs; r++)); do ui_once; done | median)   load $(load)"
fi
echo "check devices/pair.toml:    $(for ((r = 0; r < runs; r++)); do wall $exe check devices/pair.toml; done | median)   load $(load)"
echo "spectrum devices/pair.toml: $(for ((r = 0; r < runs; r++)); do wall $exe spectrum devices/pair.toml; done | median)   load $(load)"
sweep=($exe sweep "$bench/reference_device.toml" --vary cp.flux=0:0.5:201 --csv)
if [ "$numpy" = "--numpy" ]; then
  # interleaved, so both see the same machine
  ours=() theirs=()
  for ((r = 0; r < runs; r++)); do
    ours+=("$(wall "${sweep[@]}")")
    theirs+=("$(wall /usr/bin/python3 "$bench/numpy_reference_sweep.py" 201)")
  done
  mo=$(printf '%s\n' "${ours[@]}" | median) mt=$(printf '%s\n' "${theirs[@]}" | median)
  echo "sweep 201 points, leveldesign: $mo"
  echo "sweep 201 points, numpy script: $mt"
    echo "ratio of wall-time medians: $(echo "$(awk '{print $2}' <<<"$mt") / $(awk '{print $2}' <<<"$mo")" | bc -l | xargs printf '%.1f')x   load $(load)"
else
  echo "sweep 201 points (reference device): $(for ((r = 0; r < runs; r++)); do wall "${sweep[@]}"; done | median)   load $(load)"
fi
