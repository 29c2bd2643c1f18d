// The form of the common inputs of a system file. Values the form cannot show (other
// fields, {min, max} ranges, units) are kept from a loaded file and sent along; the
// server checks everything, and its issues are placed under the field they name.
import { el, fill } from './format.js';
import { deleteAt, getAt, isUnder, leafPaths, prune, setAt } from './paths.js';

const Q = 'quantity';

export const FORM_GROUPS = [
  {
    legend: 'Planet',
    fields: [
      { path: 'name', label: 'Name', kind: 'text', required: true },
      { path: 'planet.radiusRatio', label: 'Radius ratio R_p/R_⋆', kind: Q, required: true },
      { path: 'planet.scaledSemiMajorAxis', label: 'Scaled semi-major axis a/R_⋆', kind: Q, required: true },
      { path: 'planet.inclinationDeg', label: 'Inclination', unit: 'deg', kind: Q },
      { path: 'planet.periodDays', label: 'Orbital period', unit: 'days', kind: Q },
      { path: 'planet.massMjup', label: 'Mass', unit: 'M_Jup', kind: Q },
    ],
  },
  {
    legend: 'Star',
    fields: [
      { path: 'star.teffK', label: 'Effective temperature', unit: 'K', kind: Q, required: true },
      { path: 'star.radiusRsun', label: 'Radius', unit: 'R_☉', kind: Q },
      { path: 'star.massMsun', label: 'Mass', unit: 'M_☉', kind: Q },
      { path: 'star.metallicity', label: 'Metallicity [M/H]', unit: 'dex', kind: 'number' },
    ],
  },
  {
    legend: 'Measurement',
    fields: [
      { path: 'band', label: 'Band', kind: 'band', required: true },
      { path: 'measurements.eclipseDepthPpm', label: 'Eclipse depth', unit: 'ppm', kind: Q },
      { path: 'measurements.phaseAmplitudePpm', label: 'Phase amplitude, peak to trough', unit: 'ppm', kind: Q },
      { path: 'measurements.daysideTemperatureK', label: 'Dayside temperature from another band', unit: 'K', kind: Q },
    ],
  },
  {
    legend: 'Assumptions',
    fields: [
      { path: 'assumptions.thermal', label: 'Thermal emission', kind: 'choice', options: [['', 'modelled (default)'], ['self-consistent', 'modelled'], ['none', 'none: pure reflection']] },
      { path: 'assumptions.samples', label: 'Draws', kind: 'number', placeholder: '4000' },
      { path: 'assumptions.seed', label: 'Seed', kind: 'number', placeholder: '1' },
    ],
  },
];

const FIELDS = FORM_GROUPS.flatMap((g) => g.fields);
const idOf = (path) => `f-${path.replace(/\./g, '-')}`;
const KEPT_BAND = '__kept';

/** Label text with "_x" written as a subscript. */
function labelNodes(text) {
  const parts = text.split(/(_[^\s/]+)/);
  return parts.map((p) => (p.startsWith('_') ? el('sub', {}, p.slice(1)) : p));
}

function input(id, label, extra = {}) {
  return [
    el('label', { for: id, class: 'sr-only' }, label),
    el('input', { id, type: 'text', inputmode: 'decimal', autocomplete: 'off', ...extra }),
  ];
}

function fieldRow(f, bands) {
  const id = idOf(f.path);
  const errors = el('ul', { class: 'field-errors', id: `${id}-errors` });
  const kept = el('p', { class: 'kept-note', id: `${id}-kept`, hidden: true });
  const described = `${id}-errors ${id}-kept`;
  const label = el('span', { class: 'field-label', id: `${id}-label` }, ...labelNodes(f.label), f.unit ? el('span', { class: 'unit' }, ' [', ...labelNodes(f.unit), ']') : null, f.required ? el('span', { class: 'required', 'aria-hidden': 'true' }, ' *') : null);
  let controls;
  if (f.kind === Q) {
    const plain = f.label.replace(/_/g, '');
    controls = el('div', { class: 'quantity', role: 'group', 'aria-labelledby': `${id}-label` },
      ...input(`${id}-value`, `${plain}: value`, { 'aria-describedby': described, placeholder: 'value' }),
      el('span', { class: 'pm', 'aria-hidden': 'true' }, '±'),
      ...input(`${id}-sigma`, `${plain}: 1-sigma uncertainty (the upper one when the lower is given)`, { 'aria-describedby': described, placeholder: 'σ' }),
      el('span', { class: 'pm', 'aria-hidden': 'true' }, '−'),
      ...input(`${id}-minus`, `${plain}: lower 1-sigma uncertainty, if asymmetric`, { 'aria-describedby': described, placeholder: 'σ₋' }),
    );
  } else if (f.kind === 'band') {
    const select = el('select', { id: `${id}-value`, 'aria-labelledby': `${id}-label`, 'aria-describedby': described },
      ...bands.map((b) => el('option', { value: b.id }, `${b.label} (${b.minNm}–${b.maxNm} nm)`)),
      el('option', { value: KEPT_BAND, hidden: true }, 'as in the loaded file'));
    controls = el('div', { class: 'single' }, select);
  } else if (f.kind === 'choice') {
    const select = el('select', { id: `${id}-value`, 'aria-labelledby': `${id}-label`, 'aria-describedby': described },
      ...f.options.map(([v, t]) => el('option', { value: v }, t)));
    controls = el('div', { class: 'single' }, select);
  } else {
    const box = el('input', { id: `${id}-value`, type: 'text', autocomplete: 'off', inputmode: f.kind === 'number' ? 'decimal' : undefined, placeholder: f.placeholder, 'aria-labelledby': `${id}-label`, 'aria-describedby': described });
    controls = el('div', { class: 'single' }, box);
  }
  return el('div', { class: 'field', 'data-path': f.path }, label, controls, kept, errors);
}

/** A number if the text is one, else the text itself (the server names what is wrong). */
function numberOrText(text) {
  const t = text.trim();
  if (t === '') return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? n : t;
}

function quantityFromInputs(value, sigma, minus) {
  const v = numberOrText(value);
  const s = numberOrText(sigma);
  const m = numberOrText(minus);
  if (v === undefined && s === undefined && m === undefined) return undefined;
  if (s === undefined && m === undefined) return v;
  if (m === undefined) return { value: v ?? null, sigma: s };
  return { value: v ?? null, plus: s ?? null, minus: m };
}

/** The inputs a quantity fills, or undefined when the form cannot show it. */
function quantityToInputs(q) {
  if (typeof q === 'number') return [String(q), '', ''];
  if (q === null || typeof q !== 'object' || Array.isArray(q) || q.unit !== undefined) return undefined;
  const keys = Object.keys(q).sort().join(',');
  if (keys === 'value') return [String(q.value), '', ''];
  if (keys === 'sigma,value') return [String(q.value), String(q.sigma), ''];
  if (keys === 'minus,plus,value') return [String(q.value), String(q.plus), String(q.minus)];
  return undefined;
}

export class SystemForm {
  constructor(container, keptBox, bands) {
    this.container = container;
    this.keptBox = keptBox;
    this.bands = bands;
    this.kept = {};
    fill(container, ...FORM_GROUPS.map((g) => el('fieldset', { class: 'field-group' }, el('legend', {}, g.legend), ...g.fields.map((f) => fieldRow(f, bands)))));
    const first = bands.find((b) => b.id === 'tess') ?? bands[0];
    if (first) this.value('band').value = first.id;
  }

  value(path, part = 'value') {
    return document.getElementById(`${idOf(path)}-${part}`);
  }

  /** Fills the form from a system-file object; what it cannot show is kept and listed. */
  load(system) {
    const rest = structuredClone(system ?? {});
    delete rest.$schema;
    for (const f of FIELDS) {
      const v = getAt(system, f.path);
      const note = document.getElementById(`${idOf(f.path)}-kept`);
      note.hidden = true;
      if (f.kind === Q) {
        const parts = v === undefined ? ['', '', ''] : quantityToInputs(v);
        if (parts) {
          ['value', 'sigma', 'minus'].forEach((p, i) => { this.value(f.path, p).value = parts[i]; });
          deleteAt(rest, f.path);
        } else {
          ['value', 'sigma', 'minus'].forEach((p) => { this.value(f.path, p).value = ''; });
          note.hidden = false;
          note.textContent = `From the file: ${JSON.stringify(v)} (typing here replaces it).`;
        }
      } else if (f.kind === 'band') {
        const id = typeof v === 'string' ? this.bands.find((b) => b.id.toLowerCase() === v.toLowerCase())?.id : undefined;
        if (id) {
          this.value(f.path).value = id;
          deleteAt(rest, f.path);
        } else if (v !== undefined) {
          this.value(f.path).value = KEPT_BAND;
          note.hidden = false;
          note.textContent = `From the file: ${JSON.stringify(v).slice(0, 120)} (choosing a band replaces it).`;
        }
      } else {
        const ok = f.kind === 'number' ? typeof v === 'number' : typeof v === 'string' && (f.kind !== 'choice' || f.options.some(([o]) => o === v));
        this.value(f.path).value = ok ? String(v) : '';
        if (ok) deleteAt(rest, f.path);
      }
    }
    this.kept = prune(rest);
    this.showKept();
  }

  showKept() {
    const paths = leafPaths(this.kept);
    this.keptBox.hidden = paths.length === 0;
    if (paths.length === 0) return;
    const forget = el('button', { type: 'button', class: 'link-button' }, 'Forget them');
    forget.addEventListener('click', () => {
      for (const f of FIELDS) {
        const note = document.getElementById(`${idOf(f.path)}-kept`);
        note.hidden = true;
        if (f.kind === 'band' && this.value(f.path).value === KEPT_BAND) this.value(f.path).value = this.bands[0]?.id ?? '';
      }
      this.kept = {};
      this.showKept();
    });
    fill(this.keptBox,
      el('p', {}, 'Also sent from the loaded file (not shown as fields): ', el('code', {}, paths.join(', ')), '. '),
      forget);
  }

  /** The system-file object the form describes. */
  read() {
    const out = structuredClone(this.kept);
    for (const g of ['star', 'planet', 'measurements']) if (out[g] === undefined) out[g] = {};
    for (const f of FIELDS) {
      let v;
      if (f.kind === Q) v = quantityFromInputs(this.value(f.path, 'value').value, this.value(f.path, 'sigma').value, this.value(f.path, 'minus').value);
      else if (f.kind === 'band') {
        const b = this.value(f.path).value;
        v = b === KEPT_BAND ? undefined : b;
      } else if (f.kind === 'number') v = numberOrText(this.value(f.path).value);
      else {
        const t = this.value(f.path).value;
        v = t === '' ? undefined : t;
      }
      if (v !== undefined) setAt(out, f.path, v);
    }
    return out;
  }

  clearIssues() {
    for (const node of this.container.querySelectorAll('[aria-invalid="true"]')) node.removeAttribute('aria-invalid');
    for (const list of this.container.querySelectorAll('.field-errors')) list.replaceChildren();
    for (const row of this.container.querySelectorAll('.field.has-error')) row.classList.remove('has-error');
  }

  /** Puts each issue under the field its path names; returns the issues no field shows, and the first input marked. */
  showIssues(issues) {
    this.clearIssues();
    const unplaced = [];
    let first;
    for (const issue of issues) {
      const f = FIELDS.filter((x) => isUnder(issue.path, x.path)).sort((a, b) => b.path.length - a.path.length)[0];
      if (!f) {
        unplaced.push(issue);
        continue;
      }
      const rest = issue.path.slice(f.path.length);
      const part = f.kind !== Q ? 'value' : /^\.(sigma|plus)/.test(rest) ? 'sigma' : /^\.minus/.test(rest) ? 'minus' : 'value';
      const target = this.value(f.path, part);
      target.setAttribute('aria-invalid', 'true');
      first ??= target;
      const id = idOf(f.path);
      document.getElementById(`${id}-errors`).append(el('li', { 'data-path': issue.path }, issue.message));
      target.closest('.field').classList.add('has-error');
    }
    return { unplaced, first };
  }
}
