import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ERROR_CODES } from '../src/errors.ts';
import { withErrorTable } from '../scripts/error-table.ts';

const root = new URL('../', import.meta.url).pathname;

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const full = path.join(dir, f);
    return statSync(full).isDirectory() ? sourceFiles(full) : full.endsWith('.ts') ? [full] : [];
  });
}

describe('error catalogue', () => {
  it('every code raised in src/ is in ERROR_CODES', () => {
    const known = new Set(Object.keys(ERROR_CODES));
    const used = new Set<string>();
    const pattern = /(?:inputError|HesperError|apiError|fail)\(\s*'([a-z][a-z-]*)'/g;
    for (const file of sourceFiles(path.join(root, 'src'))) {
      for (const m of readFileSync(file, 'utf8').matchAll(pattern)) used.add(m[1]!);
    }
    expect(used.size).toBeGreaterThan(5);
    for (const code of used) expect(known, `code "${code}" is raised but not documented`).toContain(code);
  });

  it('the README lists every code with its meaning and fix (npm run docs regenerates it)', () => {
    const readme = readFileSync(path.join(root, 'README.md'), 'utf8');
    expect(readme).toBe(withErrorTable(readme));
    for (const code of Object.keys(ERROR_CODES)) expect(readme).toContain(`\`${code}\``);
  });
});
