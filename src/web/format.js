// Number formatting and small DOM helpers shared by the page's modules.

/**
 * A number as shown on the page: whole numbers from 100 up, three significant figures
 * below, exponent notation under 0.001. Always text that parseFloat reads back.
 */
export function fmt(x) {
  if (x === null || x === undefined || typeof x !== 'number' || !Number.isFinite(x)) return '–';
  const a = Math.abs(x);
  if (a === 0) return '0';
  if (a >= 100) return String(Math.round(x));
  if (a < 1e-3) return x.toExponential(2);
  return String(Number(x.toPrecision(3)));
}

/** "lo – hi" of two numbers. */
export function fmtRange(lo, hi) {
  return `${fmt(lo)} – ${fmt(hi)}`;
}

/** A percentage with no more precision than it deserves. */
export function fmtProbability(p) {
  if (p === null || p === undefined || !Number.isFinite(p)) return '–';
  if (p > 0.999) return '> 99.9 %';
  if (p < 0.001) return '< 0.1 %';
  return `${Number((p * 100).toPrecision(p < 0.1 ? 2 : 3))} %`;
}

/** Creates an element with attributes and children (strings become text nodes). */
export function el(tag, attrs = {}, ...children) {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) {
    if (v === undefined || v === null || v === false) continue;
    if (k === 'class') node.className = v;
    else if (k === 'text') node.textContent = v;
    else if (k.startsWith('data-') || k.startsWith('aria-') || k === 'role' || k === 'for' || k === 'id' || k === 'type' || k === 'name' || k === 'value' || k === 'title' || k === 'inputmode' || k === 'autocomplete' || k === 'scope' || k === 'colspan') node.setAttribute(k, v === true ? '' : String(v));
    else node[k] = v;
  }
  for (const c of children.flat()) {
    if (c === undefined || c === null || c === false) continue;
    node.append(typeof c === 'string' ? document.createTextNode(c) : c);
  }
  return node;
}

/** Replaces the children of a node. */
export function fill(node, ...children) {
  node.replaceChildren(...children.flat().filter((c) => c !== undefined && c !== null && c !== false));
}

/** Offers text as a file download. */
export function download(text, fileName, type) {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = el('a', { href: url, download: fileName });
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** A file name from a planet name. */
export function fileStem(name) {
  const stem = String(name ?? 'planet').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
  return stem === '' ? 'planet' : stem.slice(0, 60);
}
