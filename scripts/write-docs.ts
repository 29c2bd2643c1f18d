// npm run docs: regenerates the generated blocks of README.md.
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { withErrorTable } from './error-table.ts';

const readme = fileURLToPath(new URL('../README.md', import.meta.url));
writeFileSync(readme, withErrorTable(readFileSync(readme, 'utf8')));
process.stdout.write('README.md: error-code table regenerated\n');
