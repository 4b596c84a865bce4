#!/usr/bin/env bash
# `npm run test:e2e -- [jest args]`: only the end-to-end tests, on a database and a web
# export of this invocation's own, so several can run side by side while screens are built.
# `npm test` stays the one command that runs everything.
source "$(dirname "$0")/lib.sh"
ensure_node_modules_and_postgres
ensure_chromium
tag="e2e_$$"
DB="sheetkeeper_$tag"
# Not under .data: express.static and sendFile refuse paths with a dot-folder in them.
WEB="${TMPDIR:-/tmp}/sheetkeeper-dist-$tag"
LOGS="$ROOT/.data/$tag"
mkdir -p "$LOGS"
cleanup() {
  kill "${server_pid:-0}" 2>/dev/null || true
  rm -rf "$WEB" "$LOGS"
  admin_psql postgres -c "DROP DATABASE IF EXISTS \"$DB\" WITH (FORCE)" >/dev/null 2>&1 || true
}
trap cleanup EXIT
ensure_database "$DB" fresh
SHEETKEEPER_DB="$DB" node --import tsx scripts/migrate.ts
log "exporting the web app into $WEB"
CI=1 npx expo export -p web --output-dir "$WEB" >"$LOGS/export.log" 2>&1 || { cat "$LOGS/export.log" >&2; exit 1; }
PORT="$(free_port)"
SMTP_PORT="$(free_port)"
# Seeded with this server's ports, so the links in the demo regression mail point at it.
SHEETKEEPER_DB="$DB" SHEETKEEPER_PORT="$PORT" SHEETKEEPER_SMTP_PORT="$SMTP_PORT" node --import tsx scripts/seed.ts
SHEETKEEPER_DB="$DB" SHEETKEEPER_PORT="$PORT" SHEETKEEPER_SMTP_PORT="$SMTP_PORT" SHEETKEEPER_WEB_DIR="$WEB" node --import tsx server/main.ts >"$LOGS/server.log" 2>&1 &
server_pid=$!
for _ in $(seq 1 120); do
  node -e "fetch('http://127.0.0.1:$PORT/api/me').then((r) => process.exit(r.status === 401 ? 0 : 1), () => process.exit(1))" && break
  kill -0 "$server_pid" 2>/dev/null || { cat "$LOGS/server.log" >&2; exit 1; }
  sleep 0.25
done
# Journeys that need mail in the Outbox send it to the local mail store directly.
SHEETKEEPER_E2E_URL="http://127.0.0.1:$PORT" SHEETKEEPER_E2E_SMTP_PORT="$SMTP_PORT" npx jest -c jest.e2e.config.js "$@"
