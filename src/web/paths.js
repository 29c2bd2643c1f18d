// Reading and writing nested values of a system file by dotted path ("planet.radiusRatio").

export function getAt(obj, path) {
  let v = obj;
  for (const key of path.split('.')) {
    if (v === null || typeof v !== 'object') return undefined;
    v = v[key];
  }
  return v;
}

export function setAt(obj, path, value) {
  const keys = path.split('.');
  let v = obj;
  for (const key of keys.slice(0, -1)) {
    if (v[key] === null || typeof v[key] !== 'object' || Array.isArray(v[key])) v[key] = {};
    v = v[key];
  }
  v[keys[keys.length - 1]] = value;
}

export function deleteAt(obj, path) {
  const keys = path.split('.');
  let v = obj;
  for (const key of keys.slice(0, -1)) {
    if (v === null || typeof v !== 'object') return;
    v = v[key];
  }
  if (v !== null && typeof v === 'object') delete v[keys[keys.length - 1]];
}

/** Removes empty objects, deepest first. */
export function prune(obj) {
  for (const [k, v] of Object.entries(obj)) {
    if (v !== null && typeof v === 'object' && !Array.isArray(v)) {
      prune(v);
      if (Object.keys(v).length === 0) delete obj[k];
    }
  }
  return obj;
}

/** Dotted paths of the leaves (a quantity object counts as one leaf below its field). */
export function leafPaths(obj, prefix = '', depth = 0) {
  const out = [];
  for (const [k, v] of Object.entries(obj)) {
    const p = prefix === '' ? k : `${prefix}.${k}`;
    const group = depth === 0 && ['star', 'planet', 'measurements', 'assumptions'].includes(k);
    if (group && v !== null && typeof v === 'object' && !Array.isArray(v)) out.push(...leafPaths(v, p, depth + 1));
    else out.push(p);
  }
  return out;
}

/** Whether `path` (an issue path such as "planet.radiusRatio.sigma" or "band[0]") lies at or below `field`. */
export function isUnder(path, field) {
  return path === field || path.startsWith(`${field}.`) || path.startsWith(`${field}[`);
}
