#!/usr/bin/env bash
# Smoke test of the real terminal UI in tmux at 80x24, 100x30 and 120x40: sends keys, captures the pane, checks text
# (the key bar, the bias marker and the F9 question fit; Esc cancels a fit).
# Also kills the process mid-edit (kill -9) and checks that the next start offers the recovered edits.
# Usage: tests/ui-smoke.sh            (skips with exit 0 when tmux is missing)
# LEVELDESIGN_CMD overrides how the UI is started (default: dotnet <built leveldesign.dll>).
set -euo pipefail
cd "$(dirname "$0")/.."
if ! command -v tmux >/dev/null; then echo "ui-smoke: tmux not found, skipped"; exit 0; fi

dotnet build src/LevelDesign/LevelDesign.csproj -nologo -v q >/dev/null
CMD=${LEVELDESIGN_CMD:-"dotnet $(pwd)/src/LevelDesign/bin/Debug/net10.0/leveldesign.dll"}
WORK=$(mktemp -d)
SESSION="ld-smoke-$$"
trap 'tmux kill-session -t "$SESSION" 2>/dev/null || true; rm -rf "$WORK"' EXIT

# The device: a copy of the example file, so saves and autosaves stay in the temporary folder.
cp devices/pair.toml "$WORK/pair.toml"
export NO_COLOR=1 TERM=xterm-256color

fail=0
capture() { tmux capture-pane -t "$SESSION" -p; }
# Waits for text (grep -F), or with GREP=-P for a Perl regex (rows whose column widths follow the longest name).
wait_for() { # text, seconds
  local i
  for ((i = 0; i < ${2:-20} * 5; i++)); do
    if capture | grep -q "${GREP:--F}" -- "$1"; then return 0; fi
    sleep 0.2
  done
  echo "FAIL: '$1' did not appear; screen was:"; capture; fail=1; return 1
}
wait_for_re() { GREP=-P wait_for "$@"; }
has_braille() { capture | grep -qP '[\x{2801}-\x{28FF}]' || { echo "FAIL: no braille dots drawn"; capture; fail=1; }; }
start() { # width height
  tmux kill-session -t "$SESSION" 2>/dev/null || true
  tmux new-session -d -s "$SESSION" -x "$1" -y "$2" "cd '$WORK' && $CMD pair.toml; echo UI-EXITED; sleep 30"
}
keys() { tmux send-keys -t "$SESSION" "$@"; sleep 0.3; }
clear_field() { keys End; for _ in $(seq "${1:-30}"); do tmux send-keys -t "$SESSION" BSpace; done; sleep 0.2; }
# Fails unless the key bar (the row above the bottom border) ends with the given entry.
key_bar_ends_with() { capture | grep -qP -- "\\Q$1\\E *│$" || { echo "FAIL: the key bar does not end with '$1'"; capture; fail=1; }; }

echo "== 80x24: open, edit, sweep, cursor"
start 80 24
wait_for "States at cursor" 40
wait_for "trunc" 20
key_bar_ends_with "F1 all keys"
wait_for_re "flux +0 Φ0 ← qa_flux" 5
keys F9
wait_for "» target: QUANTITY = VALUE by BIAS LOW to HIGH" 5
wait_for "  or  fit PATH [LOW..HIGH] [PATH ...] to QUANTITY = VALUE [at POINT][, ...]" 5
keys Escape
keys Enter; keys Enter              # board → form → edit the first value
wait_for "» elements." 5
clear_field; keys "210 MHz" Enter
wait_for "● unsaved" 10
wait_for "210 MHz" 5
keys F5; wait_for "» sweep:" 5; keys Enter
wait_for "found, F3 lists them" 60   # the crossings message keeps "sweep done: …" in front of it
wait_for "sweep done" 5
has_braille
keys Right Right Right
wait_for "cursor " 5
capture > "$WORK/80x24.txt"
grep -q 'elements.qa.ec' "$WORK/pair.toml.autosave" 2>/dev/null || grep -q '210 MHz' "$WORK/pair.toml.autosave" || { echo "FAIL: the autosave is not the edited TOML"; fail=1; }

echo "== kill -9 mid-edit, then the next start offers recovery"
pid=$(tmux list-panes -t "$SESSION" -F '#{pane_pid}')
child=$(pgrep -P "$pid" -f leveldesign || true)
[[ -n "$child" ]] && kill -9 $child
wait_for "UI-EXITED" 10
test -f "$WORK/pair.toml.autosave" || { echo "FAIL: no autosave sidecar after the edit"; fail=1; }
start 80 24
wait_for "found edits not saved" 40
keys r
wait_for "● unsaved" 10

echo "== save, then quit"
keys C-s
# wait for the file itself: "saved" on screen also matches "● unsaved", and the message may be cut at 80 columns
for _ in $(seq 50); do [[ -f "$WORK/pair.toml.bak" && ! -e "$WORK/pair.toml.autosave" ]] && break; sleep 0.2; done
test -f "$WORK/pair.toml.bak" || { echo "FAIL: no .bak after save"; fail=1; }
test -f "$WORK/pair.toml.autosave" && { echo "FAIL: autosave left after save"; fail=1; }
keys C-q
wait_for "UI-EXITED" 10

echo "== quit guard"
start 80 24
wait_for "States at cursor" 40
keys Enter; keys Enter; clear_field; keys "215 MHz" Enter
wait_for "● unsaved" 10
keys C-q
wait_for "unsaved changes" 5
keys Escape
keys C-q; keys d
wait_for "UI-EXITED" 10

# The designer's task at 80x24 and 120x40: Tab focus, a relative target applied, the quantities page along a coupler
# sweep, a two-level defect added with Insert, undo, and idle against coupler_low on the compare page.
# F3 until the page with this title shows (each press waits for the screen to follow).
page_to() {
  local i j
  for ((i = 0; i < 10; i++)); do
    for ((j = 0; j < 5; j++)); do capture | grep -qF -- "$1" && return 0; sleep 0.2; done
    keys F3
  done
  echo "FAIL: no page '$1' after ten F3"; capture; fail=1; return 1
}
designer_task() { # width height
  cp devices/pair.toml "$WORK/pair.toml"; rm -f "$WORK/pair.toml.autosave" "$WORK/pair.toml.bak"
  start "$1" "$2"
  wait_for "States at cursor" 40
  wait_for "trunc" 20
  wait_for "╔╡Board╞" 5                      # the focused panel has a double border
  keys Tab; wait_for "╔╡Parameters: qa╞" 5
  keys BTab; wait_for "╔╡Board╞" 5
  keys F9; clear_field 80
  keys "qa.f01 - qb.f01 = 700 MHz by qb_flux 0 to 0.3" Enter
  wait_for "digit applies" 60
  keys 1
  wait_for "biases.qb_flux.value =" 10
  wait_for "● unsaved" 5
  keys F5; wait_for "» sweep:" 5; keys Enter
  wait_for "sweep done" 90
  page_to "Quantities along the sweep"
  wait_for "zz:qa:qb:" 10
  for _ in 1 2 3; do capture | grep -qF "╔╡Quantities" && break; keys Tab; done
  keys Enter; wait_for "» plot along the sweep" 5
  clear_field 250; keys "purity:qa1, zz:qa:qb" Enter
  wait_for "purity:qa1:" 10
  keys Tab; keys BTab; keys BTab                # back to the board, wherever focus was
  for _ in 1 2 3; do capture | grep -qF "╔╡Board╞" && break; keys Tab; done
  keys IC; wait_for "d two-level defect" 5
  keys d; wait_for "id of the new two-level defect" 5
  keys Enter
  wait_for "added two-level defect" 10
  grep -q '^\[elements.d1\]' "$WORK/pair.toml.autosave" || { echo "FAIL: the autosave lacks the new defect"; fail=1; }
  keys C-z
  wait_for "undo" 10
  sleep 0.5
  grep -q '^\[elements.d1\]' "$WORK/pair.toml.autosave" && { echo "FAIL: undo left the defect in the autosave"; fail=1; }
  keys End; wait_for "coupler_low" 5
  keys Enter; wait_for "At point coupler_low" 30
  keys b
  page_to "Compare A and B"
  wait_for "B: point coupler_low" 5
  wait_for "qa.f01" 5
  capture > "$WORK/designer-$1x$2.txt"
  keys C-q; wait_for "unsaved changes" 5; keys d
  wait_for "UI-EXITED" 10
}

echo "== 80x24: the designer's task (focus, relative target, quantities, Insert a defect, undo, compare)"
designer_task 80 24
echo "== 120x40: the designer's task"
designer_task 120 40

echo "== 100x30: the whole bias marker; a fit cancelled with Esc leaves the file as it was"
cp devices/pair.toml "$WORK/pair.toml"; rm -f "$WORK/pair.toml.autosave"
start 100 30
wait_for "States at cursor" 40
wait_for "trunc" 20
wait_for_re "flux +0 Φ0 ← bias qa_flux" 5
key_bar_ends_with "F1 all keys"
keys F9; clear_field 60
# six parameters, six targets at three settings: tens of seconds if not cancelled
keys "fit qa.ej_sum qa.ec qb.ej_sum qb.ec qc.ej_sum qc.ec to qa.f01 = 5.5 GHz at idle, qa.anharmonicity = -220 MHz at coupler_low, qb.f01 = 4.9 GHz at idle, qb.anharmonicity = -230 MHz at coupler_low, qc.f01 = 6.2 GHz, qc.anharmonicity = -110 MHz" Enter
wait_for "Esc cancels" 10
keys Escape
wait_for "fit cancelled" 5
sleep 1
capture | grep -qF "a applies" && { echo "FAIL: a cancelled fit offered its values"; capture; fail=1; }
cmp -s devices/pair.toml "$WORK/pair.toml" || { echo "FAIL: the cancelled fit changed the file"; fail=1; }
capture > "$WORK/100x30.txt"
keys C-q
wait_for "UI-EXITED" 10

echo "== 120x40: spectrum and states together, help, limits"
start 120 40
wait_for "States at cursor" 40
wait_for "Spectrum" 5
key_bar_ends_with "F1 Help"
keys F1; wait_for "Keys" 5
keys l; wait_for "Limits of the model" 5
capture > "$WORK/120x40.txt"
keys F1; keys C-q
wait_for "UI-EXITED" 10

if [[ $fail -ne 0 ]]; then echo "ui-smoke: FAILED"; exit 1; fi
echo "ui-smoke: all checks passed"
