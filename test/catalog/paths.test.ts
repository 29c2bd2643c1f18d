import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import { readMigrations } from '../../src/catalog/migrate.ts';
import { DEFAULT_DB_PATH, REPO_ROOT, resolveDbPath } from '../../src/catalog/paths.ts';
import { cleanupTemp, tempDbPath, tempDir } from './helpers.ts';

afterEach(cleanupTemp);

describe('database location', () => {
  it('prefers an explicit path, then HESPER_DB, then db/hesper.sqlite under the repository root', () => {
    expect(resolveDbPath('x.sqlite', { HESPER_DB: '/elsewhere/y.sqlite' }, '/work/here')).toBe(path.resolve('/work/here', 'x.sqlite'));
    expect(resolveDbPath(undefined, { HESPER_DB: 'rel/y.sqlite' }, '/work/here')).toBe(path.resolve('/work/here', 'rel/y.sqlite'));
    expect(resolveDbPath(undefined, {}, '/somewhere/else')).toBe(DEFAULT_DB_PATH);
    expect(DEFAULT_DB_PATH).toBe(path.join(REPO_ROOT, 'db', 'hesper.sqlite'));
    expect(existsSync(path.join(REPO_ROOT, 'db', 'migrations', 'meta', '_journal.json'))).toBe(true);
  });

  it('opens, migrates and seeds from any working directory (paths resolve from the module, not the cwd)', () => {
    const file = tempDbPath();
    const script = `import { openCatalog } from ${JSON.stringify(path.join(REPO_ROOT, 'src/catalog/index.ts'))};
const c = openCatalog(); process.stdout.write(JSON.stringify(c.stats())); c.close();`;
    const out = execFileSync(process.execPath, ['--import', pathToFileURL(path.join(REPO_ROOT, 'node_modules/tsx/dist/loader.mjs')).href, '--input-type=module', '-e', script], {
      cwd: tempDir('hesper-cwd-'),
      env: { ...process.env, HESPER_DB: file },
      encoding: 'utf8',
    });
    const stats = JSON.parse(out) as { path: string; entries: number; migrations: number };
    expect(stats.path).toBe(file);
    expect(stats.entries).toBeGreaterThanOrEqual(100);
    expect(stats.migrations).toBe(readMigrations().length);
  });
});
