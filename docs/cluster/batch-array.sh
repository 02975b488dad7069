#!/bin/bash
# One national study as a Slurm job array: each task runs its share of the stations.
# `binenergy batch` reads SLURM_ARRAY_TASK_ID and SLURM_ARRAY_TASK_COUNT itself and writes its part
# into OUT/tables/<table>/shard=<task>/, so the tasks never write the same file.
# Submit (see docs/cluster.md), then build the report once the whole array has finished:
#
#   job=$(sbatch --parsable --export=ALL,STUDY=study.toml,STATIONS=stations.csv,OUT=/shared/national docs/cluster/batch-array.sh)
#   sbatch --dependency=afterok:$job --wrap "binenergy batch-report /shared/national"
#
#SBATCH --job-name=binenergy-batch
#SBATCH --array=0-3
#SBATCH --ntasks=1
#SBATCH --cpus-per-task=1
#SBATCH --output=binenergy-batch-%A_%a.out
set -euo pipefail

: "${STUDY:?set STUDY to the study file (TOML)}"
: "${STATIONS:?set STATIONS to the station list (CSV with a weather column), a folder or a glob}"
: "${OUT:?set OUT to the output folder, on storage every node sees}"
# The program: binenergy on the PATH, or a command with its arguments (BINENERGY="dotnet /opt/binenergy/binenergy.dll").
read -r -a binenergy <<< "${BINENERGY:-binenergy}"
# Further batch options, e.g. BATCH_OPTIONS=--resume to rerun the array after a failure, keeping finished parts.
read -r -a options <<< "${BATCH_OPTIONS:-}"

echo "binenergy batch: array task ${SLURM_ARRAY_TASK_ID} of ${SLURM_ARRAY_TASK_COUNT} on $(hostname)"
exec "${binenergy[@]}" batch "$STUDY" --weather "$STATIONS" --out "$OUT" "${options[@]}"
