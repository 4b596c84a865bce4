#!/usr/bin/env bash
# `npm run stop`: stops the project's PostgreSQL cluster.
source "$(dirname "$0")/lib.sh"
stop_postgres
