/**
 * Write schema/<kind>.schema.json from the loader's zod schemas (run after changing src/data/schema/).
 * Usage: node --import tsx scripts/gen-schemas.ts [--check]   (--check: exit 1 when a file is stale)
 */
import { readFile, writeFile } from 'node:fs/promises';
import { jsonSchemaText, SCHEMA_KINDS } from '../src/data/jsonSchemas.ts';

const check = process.argv.includes('--check');
let stale = 0;
for (const kind of SCHEMA_KINDS) {
  const path = `schema/${kind}.schema.json`;
  const text = jsonSchemaText(kind);
  const current = await readFile(path, 'utf8').catch(() => '');
  if (current === text) continue;
  stale++;
  if (check) console.error(`${path} is out of date; run node --import tsx scripts/gen-schemas.ts`);
  else {
    await writeFile(path, text);
    console.log(`wrote ${path}`);
  }
}
process.exitCode = check && stale > 0 ? 1 : 0;
