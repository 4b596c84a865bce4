#!/usr/bin/env bash
# `npm test`: the same infrastructure as `npm start` (own databases), then the type
# check, ESLint and Prettier's check, jest (node + web projects), and end-to-end tests in Chromium against the
# exported app served by the real server. Ends with one line "Tests: N passed, N failed".
source "$(dirname "$0")/lib.sh"
began=$(date +%s)

ensure_node_modules_and_postgres
ensure_python_references
ensure_adapter_languages
ensure_chromium

OUT="$ROOT/.data/test-output"
rm -rf "$OUT" && mkdir -p "$OUT" "$ROOT/test-results"

E2E_DB=sheetkeeper_e2e
E2E_PORT="${SHEETKEEPER_E2E_PORT:-8461}"
if port_answers "$E2E_PORT"; then
  [ -n "${SHEETKEEPER_E2E_PORT:-}" ] && { log "port $E2E_PORT is taken"; exit 2; }
  E2E_PORT="$(free_port)"
  log "port 8461 is taken; the e2e server uses $E2E_PORT"
fi
E2E_SMTP_PORT="${SHEETKEEPER_E2E_SMTP_PORT:-$(free_port)}"
# The e2e seed and server keep their reference values in a cache of this run's own, made from this
# code; the node tests that run demo suites end to end start from a copy of it
# (tests/setup/seeded-reference-cache-dir.ts) instead of computing the same values again.
REFERENCE_CACHE="$OUT/reference-cache"
# NODE_ENV=test gives the e2e seed's demo users and the e2e server's decoy hashes bcrypt's minimum
# cost, as under jest (server/auth/passwords.ts): the journeys sign in ~35 times, and at cost 11
# bcrypt was 6 s of the e2e server's 21 s of main-thread CPU.
e2e_env=(env NODE_ENV=test SHEETKEEPER_DB="$E2E_DB" SHEETKEEPER_PORT="$E2E_PORT" SHEETKEEPER_SMTP_PORT="$E2E_SMTP_PORT"
  SHEETKEEPER_REFERENCE_CACHE="$REFERENCE_CACHE")
# A fresh e2e database, migrated and seeded with the e2e ports (so the links in the demo
# regression mail point at the e2e server).
prepare_e2e_database() {
  ensure_database "$E2E_DB" fresh
  "${e2e_env[@]}" node --import tsx scripts/migrate.ts
  "${e2e_env[@]}" node --import tsx scripts/seed.ts
}

# tsc, ESLint and Prettier each use one core, and neither the web export nor the e2e database
# needs anything from them: all five run side by side, each into its own log, shown whole once
# it ends.
log "type check, lint, format check, the web export and the e2e database, side by side"
start_step typecheck npm run --silent typecheck
start_step lint npx eslint --max-warnings 0 --cache --cache-strategy content --cache-location "$ROOT/.data/eslint-cache" .
start_step format npx prettier --check --log-level warn .
start_step web-export ensure_web_export
start_step e2e-database prepare_e2e_database
# The packed CLI installed into an empty folder and run there (scripts/check-cli-package.ts): 13 s
# of wall time on a quiet machine, most of it npm copying files, ~15 s of CPU; too long for a jest file.
start_step cli-package node --import tsx scripts/check-cli-package.ts
finish_step web-export
finish_step e2e-database

# The end-to-end files (one at a time against one server, much of it waiting on Chromium and the
# server) start as soon as their server is up, beside the static checks' tail and then jest's node
# and web projects; their log is shown when all have ended.
"${e2e_env[@]}" node --import tsx server/main.ts >"$OUT/e2e-server.log" 2>&1 &
server_pid=$!
trap 'kill "$server_pid" 2>/dev/null || true' EXIT
for _ in $(seq 1 120); do
  node -e "fetch('http://127.0.0.1:$E2E_PORT/api/me').then((r) => process.exit(r.status === 401 ? 0 : 1), () => process.exit(1))" && break
  kill -0 "$server_pid" 2>/dev/null || { cat "$OUT/e2e-server.log" >&2; break; }
  sleep 0.25
done
log "end-to-end project against http://127.0.0.1:$E2E_PORT, in the background"
start_step e2e env SHEETKEEPER_E2E_URL="http://127.0.0.1:$E2E_PORT" SHEETKEEPER_E2E_SMTP_PORT="$E2E_SMTP_PORT" \
  npx jest -c jest.e2e.config.js --ci --json --outputFile="$OUT/e2e.json"

tsc_status=0 lint_status=0 format_status=0 cli_package_status=0
finish_step typecheck || tsc_status=$?
finish_step lint || lint_status=$?
finish_step format || format_status=$?

log "jest: node and web projects"
SHEETKEEPER_TEST_REFERENCE_SEED="$REFERENCE_CACHE" npx jest --ci --json --outputFile="$OUT/unit.json" || true
finish_step e2e || true
finish_step cli-package || cli_package_status=$?
kill "$server_pid" 2>/dev/null || true

log "finished in $(( $(date +%s) - began )) s"
trap - ERR
node --import tsx scripts/summarize-tests.ts --step "the type check (tsc --noEmit)=$tsc_status" \
  --step "the lint (npm run lint)=$lint_status" --step "the format check (npm run format:check)=$format_status" \
  --step "the packed CLI from an empty folder (scripts/check-cli-package.ts)=$cli_package_status" "$OUT/unit.json" "$OUT/e2e.json"
