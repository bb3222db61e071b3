#!/usr/bin/env bash
# Backs up Lamplight's database with pg_dump (custom format: compressed, restorable table by table)
# into a timestamped file, then keeps only the newest LAMPLIGHT_BACKUP_KEEP backups.
# Cover images live in PostgreSQL (table `uploads`), so they are in the dump too.
#
#   scripts/backup.sh [DATABASE_URL]      (default: the local cluster's `lamplight` database)
#
# LAMPLIGHT_BACKUP_DIR   where backups go (default .data/backups)
# LAMPLIGHT_BACKUP_KEEP  how many to keep, newest first (default 14)
set -euo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
url=${1:-${DATABASE_URL:-$(bash "$root/scripts/db.sh" url lamplight)}}
dir=${LAMPLIGHT_BACKUP_DIR:-$root/.data/backups}
keep=${LAMPLIGHT_BACKUP_KEEP:-14}
[[ $keep =~ ^[1-9][0-9]*$ ]] || { echo "backup: LAMPLIGHT_BACKUP_KEEP must be a whole number ≥ 1" >&2; exit 2; }
command -v pg_dump >/dev/null || { echo "backup: pg_dump is missing (Debian: apt-get install postgresql-client)" >&2; exit 2; }

db=$(basename "${url%%\?*}")
mkdir -p "$dir"
chmod 700 "$dir"
stamp=$(date -u +%Y%m%dT%H%M%S%3NZ)
file="$dir/lamplight-$db-$stamp.dump"

# Written under a temporary name and renamed when complete, so a failed run never looks like a backup.
umask 077
pg_dump --format=custom --no-owner --no-privileges --file="$file.partial" --dbname="$url"
mv "$file.partial" "$file"
echo "backup: $file ($(du -h "$file" | cut -f1))"

# Retention: the newest $keep backups of this database stay; older ones go.
mapfile -t old < <(ls -1 "$dir"/lamplight-"$db"-*.dump | sort -r | tail -n +$((keep + 1)))
for f in "${old[@]}"; do
  rm -f -- "$f"
  echo "backup: removed old $f"
done
