/**
 * Mutating a valid JSON body at one path: replace the value there (creating the key if
 * it is missing) or remove it. Copies along the path only, so Raw tokens and
 * RawObjects of the harness survive, and a key such as "__proto__" becomes an own
 * property that JSON text then carries.
 */
import fc from 'fast-check';

export type PathKey = string | number;

export interface Mutation {
  path: PathKey[];
  value: unknown;
  remove: boolean;
}

/** Every path of a plain JSON value (objects and arrays), the root excluded. */
export function allPaths(v: unknown, prefix: PathKey[] = []): PathKey[][] {
  if (v === null || typeof v !== 'object') return prefix.length > 0 ? [prefix] : [];
  const children = Array.isArray(v) ? v.map((x, i) => [i, x] as const) : Object.entries(v as Record<string, unknown>);
  const own = prefix.length > 0 ? [prefix] : [];
  return [...own, ...children.flatMap(([k, x]) => allPaths(x, [...prefix, k]))];
}

function isContainer(v: unknown): v is Record<PathKey, unknown> {
  return v !== null && typeof v === 'object' && (Array.isArray(v) || Object.getPrototypeOf(v) === Object.prototype);
}

/** The body with `m` applied; where an earlier mutation removed or replaced a parent, nothing changes. */
export function applyMutation(body: unknown, m: Mutation): unknown {
  const [head, ...rest] = m.path;
  if (head === undefined || !isContainer(body)) return body;
  const copy = (Array.isArray(body) ? [...(body as unknown[])] : { ...body }) as Record<PathKey, unknown>;
  if (rest.length > 0) {
    const child = copy[head];
    if (!isContainer(child)) return body;
    copy[head] = applyMutation(child, { ...m, path: rest });
    return copy;
  }
  if (m.remove) {
    if (Array.isArray(copy)) (copy as unknown[]).splice(Number(head), 1);
    else delete copy[head];
  } else {
    Object.defineProperty(copy, head, { value: m.value, enumerable: true, writable: true, configurable: true });
  }
  return copy;
}

/** A mutation at one of `paths`, with a value from `valueFor(path, original)`. */
export function mutationOf(
  paths: PathKey[][],
  base: unknown,
  valueFor: (path: PathKey[], original: unknown) => fc.Arbitrary<unknown>,
): fc.Arbitrary<Mutation> {
  return fc.constantFrom(...paths).chain((path) => {
    const original = path.reduce<unknown>((v, k) => (isContainer(v) ? v[k] : undefined), base);
    // One mutation in five removes the field instead.
    return fc.record({ path: fc.constant(path), value: valueFor(path, original), remove: fc.nat(4).map((n) => n === 0) });
  });
}
