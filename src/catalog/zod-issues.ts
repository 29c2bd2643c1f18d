/** Turns zod validation failures into HesperError issues (errors are data). */
import type { z } from 'zod';
import { HesperError, type ErrorCode, type Issue } from '../errors.ts';

/** ["sources", 0, "key"] -> "sources[0].key", under an optional prefix. */
export function formatPath(prefix: string, segments: readonly PropertyKey[]): string {
  let out = prefix;
  for (const s of segments) {
    if (typeof s === 'number') out += `[${s}]`;
    else out += out === '' ? String(s) : `.${String(s)}`;
  }
  return out === '' ? '(root)' : out;
}

export function issuesFromZod(error: z.ZodError, prefix = ''): Issue[] {
  return error.issues.map((i) => ({ path: formatPath(prefix, i.path), message: i.message }));
}

/** One HesperError carrying every zod issue, each with its field path. */
export function zodFailure(code: ErrorCode, what: string, error: z.ZodError, prefix = ''): HesperError {
  const issues = issuesFromZod(error, prefix);
  const first = issues[0];
  const summary = issues.length === 1 && first ? `${first.path}: ${first.message}` : `${issues.length} problems`;
  return new HesperError(code, `${what}: ${summary}`, issues, 'input');
}
