#!/usr/bin/env bash
# Sheetkeeper in a library's CI, as a plain shell recipe (docs/ci-recipes.md). Run from the library's
# working copy:
#
#   SHEETKEEPER_TARBALL=path/or/url/sheetkeeper-cli-0.1.0.tgz bash sheetkeeper-check.sh
#
# Installs the packed CLI into a folder of its own (never into the library's package.json), runs the
# suites against the working copy, writes the JUnit file and prints a short summary of the branch
# findings. Exits 1 on branch findings, errors or failed property checks, 2 on bad input, and 0 on
# accuracy findings only (exit 3 of `sheetkeeper run`) unless SHEETKEEPER_FAIL_ON_ACCURACY=1.
#
#   SHEETKEEPER_SUITES        a suite file, folder or id, or several comma-separated
#                             (default: ./sheetkeeper-suites if present, else the demo catalogue)
#   SHEETKEEPER_TARGET_FLAGS  which library to check (default: --local ., this working copy)
#   SHEETKEEPER_OUT           where the JUnit file goes (default: sheetkeeper-results)
#   SHEETKEEPER_TOOLS         where the CLI is installed (default: a temporary folder)
#   SHEETKEEPER_NPM_FLAGS     extra flags for npm install (e.g. --offline: the tarball bundles its
#                             dependencies, so a local tarball installs without the registry)
set -euo pipefail

tarball="${SHEETKEEPER_TARBALL:?set SHEETKEEPER_TARBALL to the path or URL of the packed sheetkeeper-cli tarball}"
tools="${SHEETKEEPER_TOOLS:-$(mktemp -d)}"
out="${SHEETKEEPER_OUT:-sheetkeeper-results}"
read -r -a target_flags <<<"${SHEETKEEPER_TARGET_FLAGS:---local .}"
read -r -a npm_flags <<<"${SHEETKEEPER_NPM_FLAGS:-}"

# A local path is made absolute, since npm runs in the tools folder.
if [ -e "$tarball" ]; then tarball="$(cd "$(dirname "$tarball")" && pwd)/$(basename "$tarball")"; fi
mkdir -p "$tools" "$out"
npm install --prefix "$tools" --no-audit --no-fund --no-save "${npm_flags[@]}" "$tarball" >&2
sheetkeeper="$tools/node_modules/.bin/sheetkeeper"

if [ -n "${SHEETKEEPER_SUITES:-}" ]; then
  suites="$SHEETKEEPER_SUITES"
elif [ -d sheetkeeper-suites ]; then
  suites=sheetkeeper-suites
else
  suites="$tools/node_modules/sheetkeeper-cli/suites/demo"
fi

status=0
"$sheetkeeper" run --suite "$suites" "${target_flags[@]}" --format junit --out "$out/sheetkeeper.xml" || status=$?
# The summary is the same run again: its reference values come from the cache the first one filled.
"$sheetkeeper" run --suite "$suites" "${target_flags[@]}" --format summary || true

case "$status" in
  3)
    if [ "${SHEETKEEPER_FAIL_ON_ACCURACY:-0}" = 1 ]; then
      echo "sheetkeeper: accuracy findings only; failing because SHEETKEEPER_FAIL_ON_ACCURACY=1" >&2
    else
      echo "sheetkeeper: accuracy findings only; not failing (set SHEETKEEPER_FAIL_ON_ACCURACY=1 to fail on them)" >&2
      status=0
    fi
    ;;
esac
exit "$status"
