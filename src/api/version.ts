/** The package version, read once from package.json next to src/. */
import { readFileSync } from 'node:fs';

const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version?: unknown };

export const HESPER_VERSION: string = typeof pkg.version === 'string' ? pkg.version : '0.0.0';
