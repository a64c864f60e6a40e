#!/usr/bin/env bash
# Runs one shard of the catalog grid inside any array-job scheduler.
#   SHARD_INDEX  0-based index of this task (a CI matrix index, JOB_COMPLETION_INDEX of a
#                Kubernetes Indexed Job, SLURM_ARRAY_TASK_ID, ...)
#   SHARD_COUNT  number of tasks
#   OUT_ROOT     where shard folders go (default: shards)
#   GRID         grid file (default: designs/grid.yaml)
# Writes $OUT_ROOT/shard-$SHARD_INDEX/; join them afterwards with
#   npm run -s bentwire -- merge $OUT_ROOT/shard-* --out designs/entries
set -euo pipefail
: "${SHARD_INDEX:?set SHARD_INDEX (0-based)}" "${SHARD_COUNT:?set SHARD_COUNT}"
out="${OUT_ROOT:-shards}/shard-${SHARD_INDEX}"
npm run -s bentwire -- generate --grid "${GRID:-designs/grid.yaml}" --shard "$((SHARD_INDEX + 1))/${SHARD_COUNT}" --out "$out" --workers "${WORKERS:-2}"
