#!/usr/bin/env bash
# Restores a backup made by scripts/backup.sh, replacing what the database holds now: tables are
# dropped and recreated from the dump in one transaction (all or nothing). Stop the servers first.
#
#   scripts/restore.sh --yes FILE [DATABASE_URL]   (default: the local cluster's `lamplight` database)
set -euo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
if [[ ${1:-} != --yes ]]; then
  echo "usage: scripts/restore.sh --yes FILE [DATABASE_URL]" >&2
  echo "Restoring replaces everything in the database with the backup; --yes says you mean it." >&2
  exit 2
fi
file=${2:?usage: scripts/restore.sh --yes FILE [DATABASE_URL]}
url=${3:-${DATABASE_URL:-$(bash "$root/scripts/db.sh" url lamplight)}}
[[ -f $file ]] || { echo "restore: no such backup: $file" >&2; exit 2; }
command -v pg_restore >/dev/null || { echo "restore: pg_restore is missing (Debian: apt-get install postgresql-client)" >&2; exit 2; }

pg_restore --list "$file" >/dev/null || { echo "restore: $file is not a pg_dump custom-format backup" >&2; exit 2; }
pg_restore --clean --if-exists --no-owner --no-privileges --single-transaction --exit-on-error --dbname="$url" "$file"
echo "restore: $file restored into $(basename "${url%%\?*}")"
