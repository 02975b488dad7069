#!/usr/bin/env bash
# Runs every BinEnergy test on a fresh machine with the .NET SDK and Node.js:
# installs the outside reference packages the tests compare against (npm), then
# builds and runs the xunit tests. Extra arguments go to `dotnet test`
# (for example: ./test.sh --filter Psychrometrics).
set -euo pipefail
cd "$(dirname "$0")"

command -v node >/dev/null || { echo "test.sh: Node.js is required (the tests compare against the npm package psychrolib)" >&2; exit 1; }
npm ci --prefix tests/reference --no-audit --no-fund --loglevel=error

if ! tests/cluster/slurm-cluster.sh check 2>/dev/null; then
    echo "test.sh: Slurm is not installed (slurmctld, slurmd, munged): the Slurm array test (Cluster.SlurmArrayTests) does not run. Install it with: apt-get install slurm-wlm munge" >&2
    export BINENERGY_SLURM_ABSENT_NOTED=1
fi

if ! { command -v chromium && command -v pdftotext; } >/dev/null 2>&1; then
    echo "test.sh: Chromium or poppler-utils is not installed: the report print test (Reporting.ReportPrintTests) does not run. Install them with: apt-get install chromium poppler-utils" >&2
    export BINENERGY_BROWSER_ABSENT_NOTED=1
fi

dotnet test BinEnergy.sln --nologo "$@"
