#!/usr/bin/env bash
# Fails when server/schema.gql differs from the schema the code builds (run `npm run schema -w server`).
set -euo pipefail
cd "$(dirname "$0")/../server"
fresh=$(mktemp)
node --input-type=module -e "
import 'reflect-metadata';
import { printCheckedInSchema } from './dist/common/graphql/print-schema.js';
process.stdout.write(await printCheckedInSchema());
process.exit(0);" >"$fresh"
if ! diff -u schema.gql "$fresh"; then
  echo "server/schema.gql is stale: run 'npm run build -w server && npm run schema -w server' and commit it" >&2
  exit 1
fi
