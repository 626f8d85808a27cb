#!/usr/bin/env bash
# End-to-end check of the shell as a new user meets it: start the launcher ./ampsieve in a
# detached tmux session 120 columns wide, answer the guided questions with send-keys, run the
# ranking, and read the screen back with capture-pane; then Ctrl-C during a long ranking and a
# pasted line of a megabyte.
#
# Exit 0: passed. Exit 77: tmux is not installed (the JUnit wrapper decides whether that fails).
# Anything else: failed; the last screen is printed.
#
# The launcher builds target/ampsieve.jar when it is missing or older than the sources; run under
# Maven's integration-test phase the shaded jar already exists, so no build happens here.
set -euo pipefail

command -v tmux >/dev/null || { echo "e2e: tmux is not installed"; exit 77; }
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../../.." && pwd)"

WORK="$(mktemp -d)"
SOCKET="ampsieve-e2e-$$"       # a private tmux server: never touches the user's sessions
SESSION="e2e"
cleanup() {
  tmux -L "$SOCKET" kill-server 2>/dev/null || true
  rm -rf "$WORK"
}
trap cleanup EXIT

# a copy of the demo catalog (its search index is written next to it) and a private data folder (history)
cp -R "$ROOT/demo-catalog" "$WORK/catalog"
rm -rf "$WORK/catalog/.ampsieve-index"
mkdir -p "$WORK/data"

screen() { tmux -L "$SOCKET" capture-pane -p -J -t "$SESSION" -S -400; }

# wait_for REGEX SECONDS: until the screen (with scroll-back) matches, else fail showing it
wait_for() {
  local pattern="$1" limit="${2:-60}" waited=0
  until screen | grep -Eq -- "$pattern"; do
    if ! tmux -L "$SOCKET" has-session -t "$SESSION" 2>/dev/null; then
      echo "e2e: the shell ended while waiting for /$pattern/"; exit 1
    fi
    if [ "$waited" -ge $((limit * 5)) ]; then
      echo "e2e: no /$pattern/ after ${limit}s; the screen:"; screen; exit 1
    fi
    sleep 0.2; waited=$((waited + 1))
  done
}

# type TEXT then Enter; -l sends it literally (a leading '-' is not a tmux option)
type_line() {
  tmux -L "$SOCKET" send-keys -t "$SESSION" -l -- "$1"
  tmux -L "$SOCKET" send-keys -t "$SESSION" Enter
}

tmux -L "$SOCKET" new-session -d -s "$SESSION" -x 120 -y 50 \
  "cd '$WORK' && env XDG_DATA_HOME='$WORK/data' NO_COLOR=1 LANG=C.UTF-8 LC_ALL=C.UTF-8 '$ROOT/ampsieve' --catalog '$WORK/catalog'; echo 'e2e: shell exited'; sleep 30"
tmux -L "$SOCKET" set-option -t "$SESSION" history-limit 5000 >/dev/null

# first start: the hint says how to begin (allow time for a first build of the jar)
wait_for "Type ask to describe your stage" 300
wait_for "ampsieve> $" 60

type_line "ask"
wait_for "topology \[non-inverting\] > $"
type_line ""
wait_for "gain \[required\] > $"
type_line "100"
wait_for "temperature \[0\.\.70 C\] > $"
type_line "-40..85 C"
wait_for "limit \[required\] > $"
type_line "1 mV"
# 'done' waits until full scale and supply are asked: a new user who keeps every default is told what is not counted
wait_for "full-scale-output \[none \(open-loop gain, bandwidth and resistor terms not counted\)\] > $"
type_line "done"
wait_for "'done' comes after the supply questions"
type_line ""
wait_for "supply\.voltage \[none\] > $"
type_line ""
wait_for "supply\.variation \[0 V \(supply rejection not counted\)\] > $"
type_line ""
wait_for "rf \[10 kohm \(follower: 0; transimpedance: required\)\] > $"
type_line "done"
wait_for "limit at the output +1\.00 mV"
wait_for "^Every verdict: open-loop gain, closed-loop bandwidth and resistor ratio not counted: no"
wait_for "ampsieve \[new stage\*\]> $"
# a first-order filter at band.high; without it the noise would run to the closed-loop bandwidth
type_line "set band.filter-order 1"
wait_for "ampsieve \[new stage\*\]> $"

type_line "rank --top 5"
wait_for "^Advice" 120
# a ranking: the header for the shell's stage, the table header, a first row that fits, a pick
screen | grep -Eq "^Stage \(current stage\): non-inverting, noise gain 100, -40 °C to 85 °C" \
  || { echo "e2e: no stage header in the ranking"; screen; exit 1; }
screen | grep -Eq "^#  part +verdict +cost" || { echo "e2e: no ranking table"; screen; exit 1; }
screen | grep -Eq "^1  [a-z0-9-]+ +fits" || { echo "e2e: no fitting part ranked first"; screen; exit 1; }
screen | grep -Eq "^  Pick [a-z0-9-]+: " || { echo "e2e: no advice naming the pick"; screen; exit 1; }
screen | grep -Eq "^Every verdict: open-loop gain, closed-loop bandwidth and resistor ratio not counted" \
  || { echo "e2e: the ranking does not say which terms no verdict counts"; screen; exit 1; }

# Ctrl-C during a long ranking (the most units a stage may ask for, each simulated: minutes when
# nothing stops it), and 'show' typed at once, before the shell is back: the keys are kept, the
# ranking stops, and the stage is as it was
type_line "set trials 10000000"
wait_for "^trials = 10000000"
type_line "rank"
sleep 2
tmux -L "$SOCKET" send-keys -t "$SESSION" C-c
type_line "show"
# on a loaded machine the first Ctrl-C can land before the ranking has begun; a user presses it again
for again in 1 2 3; do
  screen | grep -Eq "^Interrupted; the current stage is as it was\.$" && break
  sleep 10
  screen | grep -Eq "^Interrupted; the current stage is as it was\.$" || tmux -L "$SOCKET" send-keys -t "$SESSION" C-c
done
wait_for "^Interrupted; the current stage is as it was\.$" 60
# what follows the last "rank" line: the interrupt, then show's stage, and no ranking
# (keys typed ahead of a prompt echo before it: the line may read "rankampsieve [new stage*]> rank")
after_rank() { screen | awk '/ampsieve \[new stage\*\]> rank$/ { text = "" } { text = text $0 "\n" } END { printf "%s", text }'; }
wait_for "^Other keys keep their defaults" 30
after_rank | grep -Eq "^  trials +10000000$" || { echo "e2e: no stage shown after Ctrl-C"; screen; exit 1; }
after_rank | grep -Eq "^  limit at the output +1\.00 mV" || { echo "e2e: the stage changed after Ctrl-C"; screen; exit 1; }
if after_rank | grep -Eq "^Advice|^#  part"; then echo "e2e: the ranking finished despite Ctrl-C"; screen; exit 1; fi

# a pasted line of a megabyte: refused with one line, quickly (unguarded, redrawing it after each
# key would take hours), and the shell goes on
head -c 999991 /dev/zero | tr '\0' '9' | { printf 'set gain '; cat; } > "$WORK/long-line"
tmux -L "$SOCKET" load-buffer "$WORK/long-line"
tmux -L "$SOCKET" paste-buffer -t "$SESSION"
tmux -L "$SOCKET" send-keys -t "$SESSION" Enter
wait_for "^Refused a line of 1000000 characters: the shell takes lines of at most 4096 characters" 300
type_line "show"
waited=0
until screen | awk '/^Refused a line/ { seen = 1 } seen' | grep -Eq "^  gain +100$"; do
  [ "$waited" -ge 150 ] && { echo "e2e: the shell did not go on after the long line"; screen; exit 1; }
  sleep 0.2; waited=$((waited + 1))
done

type_line "quit"
wait_for "not saved"
type_line "quit"
wait_for "e2e: shell exited" 30
[ -s "$WORK/data/ampsieve/history" ] || { echo "e2e: no history written under XDG_DATA_HOME"; exit 1; }
grep -q "^.*rank --top 5$" "$WORK/data/ampsieve/history" || { echo "e2e: history lacks the rank line"; exit 1; }
if grep -q "99999999" "$WORK/data/ampsieve/history"; then echo "e2e: the refused long line reached the history"; exit 1; fi
echo "e2e: passed"
