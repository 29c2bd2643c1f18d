/**
 * Turns zod issues into hesper issues: a dotted path, a readable message, and for
 * unions (the quantity forms) the problems of the form the user most likely meant,
 * rather than zod's generic "Invalid input".
 */
import type { z } from 'zod';
import { HesperError, type Issue } from '../errors.ts';
import { describeValue } from './describe-value.ts';

type ZodIssue = z.core.$ZodIssue;

export function joinPath(prefix: string, path: ReadonlyArray<PropertyKey>): string {
  let out = prefix;
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out += out === '' ? String(p) : `.${String(p)}`;
  }
  return out === '' ? '(root)' : out;
}

function valueAt(root: unknown, path: ReadonlyArray<PropertyKey>): unknown {
  let v: unknown = root;
  for (const p of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[p as string];
  }
  return v;
}

/** Picks the union branch that recognises most of the keys the user wrote. */
function bestBranch(branches: ZodIssue[][], input: unknown): ZodIssue[] {
  const isObject = input !== null && typeof input === 'object' && !Array.isArray(input);
  const keys = isObject ? Object.keys(input as object) : [];
  let best: ZodIssue[] | undefined;
  let bestScore = -Infinity;
  for (const issues of branches) {
    const rootType = issues.find((i) => i.code === 'invalid_type' && i.path.length === 0);
    if (isObject && rootType) continue; // a scalar branch cannot be what an object meant
    const unknownKeys = issues
      .filter((i) => i.code === 'unrecognized_keys' && i.path.length === 0)
      .reduce((n, i) => n + (i.code === 'unrecognized_keys' ? i.keys.length : 0), 0);
    const score = (keys.length - unknownKeys) * 100 - issues.length;
    if (score > bestScore) {
      bestScore = score;
      best = issues;
    }
  }
  return best ?? branches[0] ?? [];
}

/** Unknown keys named in a message: the first few, each cut, then how many more. */
const MAX_KEYS_NAMED = 5;
function listKeys(keys: readonly string[]): string {
  const named = keys.slice(0, MAX_KEYS_NAMED).map(describeValue).join(', ');
  return keys.length > MAX_KEYS_NAMED ? `${named} and ${keys.length - MAX_KEYS_NAMED} more` : named;
}

function readable(issue: ZodIssue, input: unknown): string {
  switch (issue.code) {
    case 'invalid_type': {
      return input === undefined ? `missing: expected ${issue.expected}` : `expected ${issue.expected}, got ${describeValue(input)}`;
    }
    case 'unrecognized_keys':
      return `unknown field${issue.keys.length > 1 ? 's' : ''} ${listKeys(issue.keys)}`;
    case 'invalid_value':
      return `must be one of ${issue.values.map(describeValue).join(', ')}, got ${describeValue(input)}`;
    default:
      return issue.message;
  }
}

/** Flattens zod issues (with union branch selection) into hesper issues. */
export function zodIssuesToIssues(issues: ReadonlyArray<ZodIssue>, root: unknown, prefix = '', base: PropertyKey[] = []): Issue[] {
  const out: Issue[] = [];
  for (const issue of issues) {
    const fullPath = [...base, ...issue.path];
    if (issue.code === 'invalid_union' && issue.errors.length > 0) {
      const input = valueAt(root, fullPath);
      const branch = bestBranch(issue.errors as ZodIssue[][], input);
      const inner = zodIssuesToIssues(branch, root, prefix, fullPath);
      if (inner.length > 0 && (input !== null && typeof input === 'object')) {
        out.push(...inner);
      } else {
        out.push({
          path: joinPath(prefix, fullPath),
          message: input === undefined
            ? `missing: ${issue.message && issue.message !== 'Invalid input' ? issue.message : 'a value is required'}`
            : issue.message && issue.message !== 'Invalid input' ? `${issue.message}, got ${describeValue(input)}` : `has the wrong form, got ${describeValue(input)}`,
          ...(input === undefined || (input !== null && typeof input === 'object') ? {} : { value: input }),
        });
      }
      continue;
    }
    const input = valueAt(root, fullPath);
    const entry: Issue = { path: joinPath(prefix, fullPath), message: readable(issue, input) };
    if (input !== undefined && typeof input !== 'object') entry.value = input;
    out.push(entry);
  }
  return out;
}

export function zodError(error: z.ZodError, root: unknown, what: string, prefix = ''): HesperError {
  const issues = zodIssuesToIssues(error.issues, root, prefix);
  return new HesperError('invalid-input', `${what}: ${issues.length} problem${issues.length === 1 ? '' : 's'}`, issues, 'input');
}
