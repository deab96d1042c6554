import 'reflect-metadata';

import { writeFileSync } from 'node:fs';
import { join } from 'node:path';

import { printCheckedInSchema } from './common/graphql/print-schema.js';

// Writes server/schema.gql, the checked-in contract the client's codegen reads.
const target = join(import.meta.dirname, '../schema.gql');
writeFileSync(target, await printCheckedInSchema());
console.log(`wrote ${target}`);
process.exit(0);
