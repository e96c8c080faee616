#!/usr/bin/env bash
# The performance targets of Quire, measured side by side with their NumPy peers.
#
#   app/src/test/resources/bench/run-benchmarks.sh [JAR ...]
#
# Run from the repository root after `mvn -B -pl app -am package -DskipTests`. With no JAR it measures
# app/target/quire.jar; with several (e.g. a build of main and one of a branch) it measures each, and the
# NumPy peers, interleaved: every round runs every target once for every jar, so that a change in the
# machine's load hits all of them alike. REPEATS rounds (default 3); the table gives the median of the rounds.
# JAVA_OPTS is passed to every java command (e.g. JAVA_OPTS=-XX:SharedArchiveFile=app/target/quire.jsa).
# A jar given as JAR@OPTS is run with the extra java options OPTS (spaces as commas), so one run can compare
# app/target/quire.jar with app/target/quire.jar@-XX:SharedArchiveFile=app/target/quire.jsa; CDS=1 does that
# for every jar with an archive it makes first.
# A spec may also name the launcher the build leaves beside the jar (app/target/quire, with the archive
# app/target/quire.jsa; DEVELOPERS.md, "Start-up"): it is run as the user runs it, with JAVA_OPTS and its own
# OPTS passed in QUIRE_JAVA_OPTS. LAUNCHER=1 adds, for each jar, the launcher beside it when there is one, e.g.
#   LAUNCHER=1 app/src/test/resources/bench/run-benchmarks.sh        # java -jar against the launcher
#
# Targets (issue 16): bench trials/s and its ratio to the matched NumPy peer; montecarlo of the gravimetric
# template with 10^6 trials end to end against its NumPy peer; evaluate of a worked example end to end; GUM
# recalculation of a 1000-input budget warm and first in a fresh JVM; batch of 10 000 rows over the gravimetric
# template (GUM), and of 200 rows with --mc; the workbench's time to content painted (needs xvfb-run).
set -u
here=$(cd "$(dirname "$0")" && pwd)
repeats=${REPEATS:-3}
jars=("$@")
if [ ${#jars[@]} -eq 0 ]; then
    jars=(app/target/quire.jar)
fi
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
template=templates/gravimetric-emf-flow-point.json
example=worked-examples/jcgm100-h1-end-gauge.json

python3 - "$work" <<'EOF'
import random, sys
# 10 000 invented flow points of the Tarrow Vale gravimetric rig, inside the template's parameter limits
random.seed(16)
with open(sys.argv[1] + "/rows.csv", "w") as f:
    f.write("id,I_net,t_tank,t_meter,p_meter,t_c,p_a,t_a,h_a\n")
    for i in range(10000):
        f.write("TV-%05d,%.3f,%.2f,%.2f,%.0f,%.3f,%.0f,%.2f,%.2f\n" % (i, random.uniform(200, 2000),
                random.uniform(15, 24), random.uniform(15, 24), random.uniform(150000, 400000),
                random.uniform(30, 300), random.uniform(97000, 103000), random.uniform(18, 24),
                random.uniform(0.3, 0.7)))
with open(sys.argv[1] + "/rows-mc.csv", "w") as f:
    f.writelines(open(sys.argv[1] + "/rows.csv").readlines()[:201])
# the same flow points for version 2 of the template, which asks for every value of the measurement: the
# balance's U, the five pulse counts of the runs (one cell, separated by ';'), the pulse value and the
# converter's half-width
random.seed(17)
rows = open(sys.argv[1] + "/rows.csv").readlines()
with open(sys.argv[1] + "/rows2.csv", "w") as f:
    f.write(rows[0].strip() + ",U_bal,N_ind,k_pulse,d_conv\n")
    for line in rows[1:]:
        i_net = float(line.split(",")[1])
        counts = ";".join("%.1f" % (10 * i_net * random.uniform(0.998, 1.002)) for _ in range(5))
        f.write(line.strip() + ",%.4f,%s,10,0.0002\n" % (max(0.0001, i_net * 6e-5), counts))
with open(sys.argv[1] + "/rows2-mc.csv", "w") as f:
    f.writelines(open(sys.argv[1] + "/rows2.csv").readlines()[:201])
EOF
# A jar built before version 2 of the gravimetric template is measured on version 1 of it and the old rows:
# BASELINE_TEMPLATE=FILE names that file (e.g. `git show 1d6eba7:templates/gravimetric-emf-flow-point.json`),
# used for every jar whose file name contains "baseline".
batch_args() {
    local spec=$1 mc=$2
    if [ -n "${BASELINE_TEMPLATE:-}" ] && [[ "$(basename "${spec%%@*}")" == *baseline* ]]; then
        echo "$BASELINE_TEMPLATE $work/rows$mc.csv"
    else
        echo "$template $work/rows2$mc.csv"
    fi
}

now() { date +%s%N; }
# wall seconds of a command, its output discarded
wall() {
    local t0 t1
    t0=$(now)
    "$@" > /dev/null 2>&1
    t1=$(now)
    echo "scale=3; ($t1 - $t0) / 1000000000" | bc
}
# a spec names a launcher (not a jar): the build's app/target/quire
is_launcher() { [[ "${1%%@*}" != *.jar ]]; }
# java with the jar spec's options, or the launcher with them: run_java SPEC args...
run_java() {
    local spec=$1
    shift
    local jar=${spec%%@*} opts=""
    if [ "$spec" != "$jar" ]; then
        opts=${spec#*@}
        opts=${opts//,/ }
    fi
    if is_launcher "$spec"; then
        QUIRE_JAVA_OPTS="${JAVA_OPTS:-} $opts" "$jar" "$@"
        return
    fi
    # shellcheck disable=SC2086
    java ${JAVA_OPTS:-} $opts -jar "$jar" "$@"
}
field() { sed -n "s/.*$1=\([0-9.]*\).*/\1/p" | tail -1; }

record() { echo "$1|$2|$3" >> "$work/results"; }

# The workbench prints workbench_content_painted_ms, the time since its process started as Java gives it
# (ProcessHandle.info().startInstant()). On Linux that start is the boot time, which /proc/stat gives in whole
# seconds, plus the process's start in clock ticks since boot: it is early by up to a second, by the same amount
# for every process of one boot (measured on the 2-core machine: 285 ms). The figure recorded here is corrected by
# that amount, measured for each start: the shell's clock just before it starts the workbench (t0) against the
# start the same rule gives for that process (its /proc/PID/stat and /proc/stat btime), so it is the time from
# the command to the content painted, for every build alike.
workbench_ms() {
    local spec=$1 log="$work/wb.log" opts="" pid painted t0 start
    command -v xvfb-run > /dev/null || { echo ""; return; }
    if [ "$spec" != "${spec%%@*}" ]; then
        opts=$(echo "${spec#*@}" | tr ',' ' ')
    fi
    : > "$log"
    rm -f "$work/wb.pid" "$work/wb.t0"
    if is_launcher "$spec"; then
        xvfb-run -a bash -c "echo \$\$ > $work/wb.pid; date +%s%3N > $work/wb.t0; QUIRE_JAVA_OPTS='${JAVA_OPTS:-} $opts \
            -Dquire.timing=true -Duser.home=$work/home' exec ${spec%%@*}" > "$log" 2>&1 &
    else
        xvfb-run -a bash -c "echo \$\$ > $work/wb.pid; date +%s%3N > $work/wb.t0; exec java ${JAVA_OPTS:-} $opts \
            -Dquire.timing=true -Duser.home=$work/home -jar ${spec%%@*}" > "$log" 2>&1 &
    fi
    for _ in $(seq 1 300); do
        grep -q workbench_content_painted_ms "$log" && break
        sleep 0.1
    done
    pid=$(cat "$work/wb.pid" 2> /dev/null)
    start=""
    if [ -n "$pid" ] && [ -r "/proc/$pid/stat" ]; then
        # field 22 of /proc/PID/stat (after the command name in parentheses): the start in clock ticks since boot
        start=$(awk -v ticks="$(getconf CLK_TCK)" -v btime="$(awk '/^btime/ {print $2}' /proc/stat)" \
            '{sub(/^.*\) /, ""); printf "%.0f", btime * 1000 + $20 * 1000 / ticks}' "/proc/$pid/stat")
    fi
    [ -n "$pid" ] && kill "$pid" 2> /dev/null
    wait 2> /dev/null
    painted=$(field workbench_content_painted_ms < "$log")
    t0=$(cat "$work/wb.t0" 2> /dev/null)
    # no figure when the error cannot be measured: an uncorrected one would not compare with the others
    if [ -n "$painted" ] && [ -n "$start" ] && [ -n "$t0" ]; then
        echo $((painted - (t0 - start)))
    else
        echo ""
    fi
}

# CDS=1 adds, for each jar, the same jar run with an application class-data-sharing archive made first by
# one montecarlo run with -XX:ArchiveClassesAtExit (DEVELOPERS.md, "Start-up")
if [ "${CDS:-0}" = 1 ]; then
    with_cds=()
    for spec in "${jars[@]}"; do
        if is_launcher "$spec"; then
            with_cds+=("$spec")
            continue
        fi
        jar=${spec%%@*}
        archive="$work/$(basename "$jar" .jar)-$(echo "$jar" | md5sum | cut -c1-8).jsa"
        java -XX:ArchiveClassesAtExit="$archive" -jar "$jar" montecarlo "$example" --trials 20000 > /dev/null 2>&1
        with_cds+=("$spec" "$jar@-XX:SharedArchiveFile=$archive")
    done
    jars=("${with_cds[@]}")
fi

# LAUNCHER=1 adds, after each jar, the launcher the build left beside it (app/target/quire)
if [ "${LAUNCHER:-0}" = 1 ]; then
    with_launcher=()
    for spec in "${jars[@]}"; do
        with_launcher+=("$spec")
        launcher=$(dirname "${spec%%@*}")/quire
        if ! is_launcher "$spec" && [ -x "$launcher" ] && [[ " ${with_launcher[*]} " != *" $launcher "* ]]; then
            with_launcher+=("$launcher")
        fi
    done
    jars=("${with_launcher[@]}")
fi

for round in $(seq 1 "$repeats"); do
    echo "round $round of $repeats" >&2
    for spec in "${jars[@]}"; do
        out=$(run_java "$spec" bench --trials 2000000 --runs 3 2>&1)
        record "bench trials/s" "$spec" "$(echo "$out" | field trials_per_second)"
    done
    out=$(cd "$here" && python3 numpy_benchmark_summaries.py 2000000 3 2>&1)
    record "bench trials/s" "numpy (same summaries)" "$(echo "$out" | field trials_per_second)"
    for spec in "${jars[@]}"; do
        record "montecarlo 1e6 s" "$spec" "$(wall run_java "$spec" montecarlo "$template" --trials 1e6)"
    done
    record "montecarlo 1e6 s" "numpy" "$(wall python3 "$here/numpy_gravimetric_montecarlo.py" 1e6)"
    for spec in "${jars[@]}"; do
        record "evaluate s" "$spec" "$(wall run_java "$spec" evaluate "$example")"
    done
    for spec in "${jars[@]}"; do
        out=$(run_java "$spec" bench --budget-inputs 1000 --runs 5 2>&1)
        record "GUM 1000 inputs warm ms" "$spec" "$(echo "$out" | field ' evaluate_ms')"
        record "GUM 1000 inputs first ms" "$spec" "$(echo "$out" | field first_evaluate_ms)"
    done
    for spec in "${jars[@]}"; do
        # shellcheck disable=SC2046
        record "batch 10000 rows s" "$spec" "$(wall run_java "$spec" batch $(batch_args "$spec" "") -o "$work/out.csv")"
        # shellcheck disable=SC2046
        record "batch --mc 200 rows x 1e5 s" "$spec" \
            "$(wall run_java "$spec" batch $(batch_args "$spec" -mc) -o "$work/out-mc.csv" --mc --trials 100000)"
    done
    for spec in "${jars[@]}"; do
        record "workbench painted ms" "$spec" "$(workbench_ms "$spec")"
    done
done

echo
echo "load average at the end: $(cut -d' ' -f1-3 /proc/loadavg); $(nproc) cores; $repeats rounds, medians"
python3 - "$work/results" <<'EOF'
import sys
from collections import OrderedDict
rows = OrderedDict()
for line in open(sys.argv[1]):
    target, who, value = line.rstrip("\n").split("|")
    rows.setdefault(target, OrderedDict()).setdefault(who, []).append(value)
def median(v):
    v = sorted(float(x) for x in v if x)
    return v[len(v) // 2] if v else float("nan")
print("%-30s %-60s %14s  %s" % ("target", "program", "median", "all rounds"))
for target, whos in rows.items():
    for who, values in whos.items():
        print("%-30s %-60s %14.4g  %s" % (target, who, median(values), " ".join(values)))
EOF
