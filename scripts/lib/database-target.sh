# For scripts/backup and scripts/restore. Source after setup.sh.
# DATABASE_URL when set (any server, e.g. production); otherwise the local cluster's `shoalwise`, started if needed.
use_database_target() {
  ensure_postgres_installed
  if [[ -n ${DATABASE_URL:-} ]]; then
    TARGET_URL="$DATABASE_URL"
  else
    start_postgres
    trap stop_postgres_if_ours EXIT
    TARGET_URL="$(database_url shoalwise)"
  fi
  # Printable without the password.
  TARGET_NAME="$(printf '%s' "$TARGET_URL" | sed -E 's#(://[^:/@]+):[^@]*@#\1:***@#')"
}
