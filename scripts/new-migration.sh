#!/usr/bin/env bash
# Generates a migration from the entity changes and registers it: scripts/new-migration.sh Name
set -euo pipefail
cd "$(dirname "$0")/.."
name="${1:?usage: scripts/new-migration.sh Name}"
out=$(TZ=UTC npx tsx node_modules/typeorm/cli.js migration:generate "server/db/migrations/$name" -d server/db/cli-data-source.ts)
echo "$out"
file=$(echo "$out" | grep -o 'server/db/migrations/[0-9]*-'"$name"'.ts' | head -1)
[ -n "$file" ] || exit 0
sed -i 's/^import { MigrationInterface, QueryRunner } from "typeorm";/import type { MigrationInterface, QueryRunner } from "typeorm";/' "$file"
class=$(grep -o 'export class [A-Za-z0-9]*' "$file" | awk '{print $3}')
base=$(basename "$file" .ts)
sed -i "1i import { $class } from './$base'" server/db/migrations/index.ts
sed -i -E "s/^(export const migrations.*)\]$/\1, $class]/" server/db/migrations/index.ts
echo "Registered $class in server/db/migrations/index.ts"
