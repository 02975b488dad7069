#!/usr/bin/env bash
# A one-node Slurm cluster on this machine for the tests, from Debian's packages (slurm-wlm, munge):
# munged, slurmctld and slurmd on localhost with a slurm.conf of its own in DIR (its state, spool,
# logs, pid files and munge socket all under DIR), the node's real CPU count and memory
# (`slurmd -C`), free TCP ports, proctrack/linuxproc, task/none, jobacct_gather/none. Nothing is
# read from or written to /etc/slurm or /etc/munge.
#
#   tests/cluster/slurm-cluster.sh start DIR   # prints the SLURM_CONF to export; waits until the node is idle
#   tests/cluster/slurm-cluster.sh stop DIR    # stops the three daemons by their pid files
#   tests/cluster/slurm-cluster.sh check       # exit 0 when the Slurm and munge programs are installed
#
# Run as root (as CI does) or as a user who may start the daemons; with root, jobs run as root.
set -euo pipefail

programs=(munged mungekey slurmctld slurmd sbatch squeue scontrol)

check() {
    local missing=()
    for p in "${programs[@]}"; do
        command -v "$p" >/dev/null 2>&1 || [ -x "/usr/sbin/$p" ] || missing+=("$p")
    done
    if [ ${#missing[@]} -gt 0 ]; then
        echo "slurm-cluster: not installed: ${missing[*]} (apt-get install slurm-wlm munge)" >&2
        return 1
    fi
}

free_port() { # a TCP port in 20000-59999 that nothing on localhost answers on
    local port
    while :; do
        port=$((20000 + RANDOM % 40000))
        (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null || { echo "$port"; return; }
    done
}

wait_for() { # seconds, description, command...
    local seconds=$1 what=$2
    shift 2
    for _ in $(seq 1 $((seconds * 10))); do
        if "$@" >/dev/null 2>&1; then return 0; fi
        sleep 0.1
    done
    echo "slurm-cluster: $what did not happen within ${seconds} s; logs in $dir" >&2
    return 1
}

start() {
    check
    dir=$(realpath -m "$1")
    mkdir -p "$dir"/{state,spool,munge,log}
    chmod 700 "$dir/munge"
    PATH=/usr/sbin:$PATH
    local user host node
    user=$(id -un)
    host=$(hostname -s)
    node=$(slurmd -C | head -1)   # NodeName=HOST CPUs=N ... RealMemory=M: what slurmd itself will report

    mungekey --create --keyfile="$dir/munge/munge.key" --force >/dev/null 2>&1 \
        || dd if=/dev/urandom of="$dir/munge/munge.key" bs=1024 count=1 status=none
    chmod 400 "$dir/munge/munge.key"
    munged --force --key-file="$dir/munge/munge.key" --socket="$dir/munge/munge.socket" \
        --pid-file="$dir/munge/munged.pid" --log-file="$dir/log/munged.log" --seed-file="$dir/munge/munge.seed"

    cat > "$dir/slurm.conf" <<CONF
# Written by tests/cluster/slurm-cluster.sh: a one-node test cluster, everything under $dir.
ClusterName=binenergy-test
SlurmctldHost=$host(127.0.0.1)
SlurmctldPort=$(free_port)
SlurmdPort=$(free_port)
SlurmUser=$user
SlurmdUser=$user
AuthType=auth/munge
CredType=cred/munge
AuthInfo=socket=$dir/munge/munge.socket
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
JobAcctGatherType=jobacct_gather/none
AccountingStorageType=accounting_storage/none
JobCompType=jobcomp/none
SchedulerType=sched/builtin
SchedulerParameters=sched_interval=1,sched_min_interval=100000
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
MpiDefault=none
ReturnToService=2
StateSaveLocation=$dir/state
SlurmdSpoolDir=$dir/spool
SlurmctldPidFile=$dir/slurmctld.pid
SlurmdPidFile=$dir/slurmd.pid
SlurmctldLogFile=$dir/log/slurmctld.log
SlurmdLogFile=$dir/log/slurmd.log
SlurmctldTimeout=30
SlurmdTimeout=30
InactiveLimit=0
MinJobAge=300
KillWait=5
Waittime=0
$node State=UNKNOWN
PartitionName=test Nodes=$host Default=YES MaxTime=INFINITE State=UP OverSubscribe=NO
CONF

    export SLURM_CONF="$dir/slurm.conf"
    slurmctld -f "$SLURM_CONF" -i
    wait_for 20 "slurmctld answering" scontrol ping
    slurmd -f "$SLURM_CONF"
    wait_for 30 "the node becoming idle" bash -c "sinfo -h -N -o '%T' | grep -qx idle"
    echo "$SLURM_CONF"
}

stop() { # SIGTERM to the three daemons by their pid files, then SIGKILL to any still running after 10 s
    dir=$(realpath -m "$1")
    local files=("$dir/slurmd.pid" "$dir/slurmctld.pid" "$dir/munge/munged.pid") pids=() f
    for f in "${files[@]}"; do
        [ -f "$f" ] && pids+=("$(cat "$f")")
    done
    [ ${#pids[@]} -gt 0 ] || return 0
    kill "${pids[@]}" 2>/dev/null || true
    local running
    for _ in $(seq 1 200); do
        running=0
        for f in "${pids[@]}"; do kill -0 "$f" 2>/dev/null && running=1; done
        [ $running = 1 ] || break
        sleep 0.05
    done
    for f in "${pids[@]}"; do kill -9 "$f" 2>/dev/null || true; done
    rm -f "${files[@]}"
}

case "${1:-}" in
    start) start "${2:?usage: $0 start DIR}" ;;
    stop) stop "${2:?usage: $0 stop DIR}" ;;
    check) check ;;
    *) echo "usage: $0 start DIR | stop DIR | check" >&2; exit 2 ;;
esac
