#!/usr/bin/env bash
# `npm start`: everything from a fresh clone to a serving app on 127.0.0.1.
source "$(dirname "$0")/lib.sh"
ensure_node_modules_and_postgres
ensure_adapter_languages
export SHEETKEEPER_DB="${SHEETKEEPER_DB:-sheetkeeper}"
ensure_database "$SHEETKEEPER_DB"
node --import tsx scripts/migrate.ts
node --import tsx scripts/seed.ts
ensure_web_export
exec node --import tsx server/main.ts
