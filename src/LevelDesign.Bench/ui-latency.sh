#!/usr/bin/env bash
# Key latency of the real terminal UI while a module's point computes (benchmark, not a test).
# Starts the UI in its own tmux session (100×30) on a copy of DEVICE, waits until it shows "⟳ computing", then sends
# KEYS arrow keys (Down/Up alternately on the board, which moves its '›' marker) and times, for each, how long until
# the screen shows the change (polling tmux every few milliseconds). Only keys answered while the status still said
# "computing" are counted as "while computing"; the others measure the same thing on an idle UI (tmux and polling
# included). Prints every latency, the median and the largest.
# Usage: src/LevelDesign.Bench/ui-latency.sh devices/line4.toml [KEYS] [COMMAND]
#   COMMAND defaults to the Release build: src/LevelDesign/bin/Release/net10.0/leveldesign
set -euo pipefail
cd "$(dirname "$0")/../.."
DEVICE=$1; KEYS=${2:-20}
CMD=${3:-"$(pwd)/src/LevelDesign/bin/Release/net10.0/leveldesign"}
WORK=$(mktemp -d)
SESSION="ld-latency-$$"
trap 'tmux kill-session -t "$SESSION" 2>/dev/null || true; rm -rf "$WORK"' EXIT
cp "$DEVICE" "$WORK/"
export NO_COLOR=1 TERM=xterm-256color
tmux new-session -d -s "$SESSION" -x 100 -y 30 "cd '$WORK' && $CMD $(basename "$DEVICE"); sleep 30"
capture() { tmux capture-pane -t "$SESSION" -p; }
now_ms() { date +%s%3N; }
for _ in $(seq 200); do capture | grep -qF "⟳ computing" && break; sleep 0.05; done
capture | grep -qF "⟳ computing" || { echo "the UI never showed '⟳ computing'"; capture; exit 1; }
echo "load: $(cut -d' ' -f1-3 /proc/loadavg)"
latencies=(); during=(); after=()
for ((k = 0; k < KEYS; k++)); do
  key=Down; ((k % 2)) && key=Up
  before=$(capture)
  start=$(now_ms)
  tmux send-keys -t "$SESSION" "$key"
  while [[ "$(capture)" == "$before" ]]; do
    (( $(now_ms) - start > 5000 )) && break
  done
  ms=$(( $(now_ms) - start ))
  latencies+=("$ms")
  if capture | grep -qF "⟳ computing"; then during+=("$ms"); else after+=("$ms"); fi
  sleep 0.15
done
status=$(capture | grep -F "│ eigen" | head -1 | tr -s ' ' || true)
echo "status after the keys: $status"
stats() { (($#)) || { printf 'n=0'; return; }; printf '%s\n' "$@" | sort -n | awk '{a[NR]=$1} END {if (NR) printf "n=%d median %d ms, largest %d ms", NR, a[int((NR+1)/2)], a[NR]; else printf "n=0"}'; }
echo "every key (ms): ${latencies[*]}"
echo "all keys: $(stats "${latencies[@]}")"
echo "keys answered while computing: $(stats "${during[@]}")"
echo "keys answered after it (the same measurement on an idle UI): $(stats "${after[@]}")"
