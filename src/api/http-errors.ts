/**
 * From failures to answers: a HesperError becomes a 4xx with its
 * code and issues; anything unexpected becomes a generic 500 whose body holds no
 * internals, and is logged with its stack through the app's logger.
 */
import type { Context } from 'hono';
import type { ContentfulStatusCode } from 'hono/utils/http-status';
import { type ErrorCode, type ErrorKind, HesperError, type Issue } from '../errors.ts';

export interface ErrorBody {
  error: { code: string; message: string; issues: Issue[] };
}

const STATUS_OF_KIND: Record<ErrorKind, ContentfulStatusCode> = {
  input: 400,
  forbidden: 403,
  'not-found': 404,
  conflict: 409,
  internal: 500,
};

/** Long texts echoed from a request are cut: an answer never repeats a whole body. */
function cut(text: string, max: number): string {
  return text.length <= max ? text : `${text.slice(0, max)}… (${text.length - max} more characters)`;
}

/** Keeps the documented issue fields and drops anything that is not plain data. */
function cleanIssue(i: Issue): Issue {
  const out: Issue = { path: cut(String(i.path), 300), message: cut(String(i.message), 1000) };
  const v = i.value;
  if (typeof v === 'string') out.value = cut(v, 200);
  else if (v === null || typeof v === 'boolean' || (typeof v === 'number' && Number.isFinite(v))) out.value = v;
  else if (typeof v === 'number') out.value = String(v);
  if (typeof i.allowed === 'string') out.allowed = i.allowed;
  return out;
}

/** At most this many issues are sent; a last one says how many were left out. */
const MAX_ISSUES = 100;

export function errorBody(code: ErrorCode | string, message: string, issues: Issue[] = []): ErrorBody {
  const shown = issues.slice(0, MAX_ISSUES).map(cleanIssue);
  if (issues.length > MAX_ISSUES) shown.push({ path: '(more)', message: `${issues.length - MAX_ISSUES} more problems not listed; correct these first` });
  return { error: { code, message: cut(message, 1000), issues: shown } };
}

export function errorResponse(c: Context, status: ContentfulStatusCode, code: ErrorCode, message: string, issues: Issue[] = []): Response {
  return c.json(errorBody(code, message, issues), status);
}

/** An input failure raised inside a route, answered with its own status. */
export class HttpInputError extends HesperError {
  readonly status: ContentfulStatusCode;

  constructor(status: ContentfulStatusCode, code: ErrorCode, message: string, issues: Issue[] = []) {
    super(code, message, issues, 'input');
    this.status = status;
  }
}

export type Logger = (line: string) => void;

const GENERIC_500 = 'unexpected failure inside hesper; nothing was changed and the server log has the details';

/** The app's onError handler. */
export function errorHandler(log: Logger) {
  return (err: Error, c: Context): Response => {
    if (err instanceof HttpInputError) return errorResponse(c, err.status, err.code, err.message, err.issues);
    if (err instanceof HesperError && err.kind !== 'internal') {
      return errorResponse(c, STATUS_OF_KIND[err.kind], err.code, err.message, err.issues);
    }
    log(`[hesper api] 500 ${c.req.method} ${c.req.path}: ${err.stack ?? err.message}`);
    return errorResponse(c, 500, 'internal', GENERIC_500);
  };
}
