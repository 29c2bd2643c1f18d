// Writes the system-file JSON Schema generated from the zod schema (npm run schema).
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { systemJsonSchemaText } from '../src/io/json-schema.ts';

const target = fileURLToPath(new URL('../src/io/system-file.schema.json', import.meta.url));
writeFileSync(target, systemJsonSchemaText());
process.stdout.write(`wrote ${target}\n`);
