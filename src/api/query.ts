/** Query strings checked with zod: unknown, repeated or malformed parameters are 400s naming the parameter. */
import type { Context } from 'hono';
import type { z } from 'zod';
import { HesperError, type Issue } from '../errors.ts';
import { zodIssuesToIssues } from '../io/zod-issues.ts';

function decode(part: string): string | undefined {
  try {
    return decodeURIComponent(part.replace(/\+/g, ' '));
  } catch {
    return undefined;
  }
}

/** Parameters of the request URL; a malformed %-escape is an issue, not a crash. */
function rawParams(url: string, issues: Issue[]): Map<string, string[]> {
  const out = new Map<string, string[]>();
  const q = url.indexOf('?');
  if (q < 0) return out;
  const search = url.slice(q + 1).split('#')[0] ?? '';
  for (const pair of search.split('&')) {
    if (pair === '') continue;
    const eq = pair.indexOf('=');
    const name = decode(eq < 0 ? pair : pair.slice(0, eq));
    const value = decode(eq < 0 ? '' : pair.slice(eq + 1));
    if (name === undefined || value === undefined) {
      issues.push({ path: 'query', message: `malformed %-escape in "${pair.slice(0, 80)}"` });
      continue;
    }
    out.set(name, [...(out.get(name) ?? []), value]);
  }
  return out;
}

export function readQuery<T extends z.ZodType>(c: Context, schema: T): z.output<T> {
  const issues: Issue[] = [];
  const flat: Record<string, string> = {};
  for (const [name, values] of rawParams(c.req.url, issues)) {
    if (values.length > 1) issues.push({ path: `query.${name}`, message: `the parameter "${name}" is given ${values.length} times; give it once` });
    // defineProperty, so "__proto__" becomes a parameter the strict schema reports, not a prototype.
    Object.defineProperty(flat, name, { value: values[0]!, enumerable: true, writable: true, configurable: true });
  }
  if (issues.length === 0) {
    const parsed = schema.safeParse(flat);
    if (parsed.success) return parsed.data;
    issues.push(...zodIssuesToIssues(parsed.error.issues, flat, 'query'));
  }
  throw new HesperError('invalid-input', `query: ${issues.length} problem${issues.length === 1 ? '' : 's'}`, issues);
}
