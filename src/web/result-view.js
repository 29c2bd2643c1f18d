// The result panel: the verdict, the posterior summary, the candidates, the details.
import { el, fill, fmt, fmtProbability, fmtRange } from './format.js';

export const SUMMARY_ROWS = [
  ['geometricAlbedo', 'Geometric albedo A_g', ''],
  ['bondAlbedo', 'Bond albedo A_B', ''],
  ['allReflectedGeometricAlbedo', 'A_g if all the signal were reflected', ''],
  ['daysideTemperatureK', 'Dayside temperature', 'K'],
  ['equilibriumTemperatureK', 'Equilibrium temperature', 'K'],
  ['reflectedDepthPpm', 'Reflected light at eclipse', 'ppm'],
  ['thermalDepthPpm', 'Thermal emission at eclipse', 'ppm'],
  ['thermalFraction', 'Thermal share of the signal', ''],
];

const VERDICT_WORDS = {
  yes: ['Clouds or ice needed', 'The planet reflects more than any feasible cloud-free reference can.'],
  no: ['No clouds or ice needed', 'A cloud-free atmosphere or bare surface can reflect this much.'],
  inconclusive: ['Undecided', 'The albedo does not separate cloudy from cloud-free.'],
};

const STATUS_MARK = { consistent: '●', marginal: '◐', untested: '◌', excluded: '○' };

function subscripted(text) {
  return text.split(/(_[A-Za-z])/).map((p) => (p.startsWith('_') ? el('sub', {}, p.slice(1)) : p));
}

function cell(field, part, value, unit) {
  return el('td', { 'data-field': field, 'data-part': part, 'data-value': String(value) }, fmt(value), unit ? ` ${unit}` : '');
}

function intervalCell(field, s, lo, hi, unit) {
  return el('td', { class: 'interval' },
    el('span', { 'data-field': field, 'data-part': lo }, fmt(s[lo])), ' – ',
    el('span', { 'data-field': field, 'data-part': hi }, fmt(s[hi])), unit ? ` ${unit}` : '');
}

export function renderVerdict(node, r) {
  const v = r.verdict;
  const [title, gloss] = VERDICT_WORDS[v.cloudsOrIceRequired] ?? [v.cloudsOrIceRequired, ''];
  node.dataset.state = v.cloudsOrIceRequired;
  fill(node,
    el('p', { class: 'verdict-kicker' }, `${r.name} · ${r.band.label} band`),
    el('p', { class: 'verdict-title', id: 'verdict-title', 'data-verdict': v.cloudsOrIceRequired }, title),
    v.probability === null ? null : el('p', { class: 'verdict-p' }, 'P(A', el('sub', {}, 'g'), ` above the cloud-free ceiling): ${fmtProbability(v.probability)}`),
    el('p', { class: 'verdict-gloss' }, gloss),
    v.reference
      ? el('p', { class: 'verdict-reference', 'data-reference': v.reference.id }, `Cloud-free reference: ${v.reference.name} (${v.reference.regime}), A`, el('sub', {}, 'g'), ` up to ${fmt(v.reference.geometricAlbedoCeiling)}.`)
      : el('p', { class: 'verdict-reference' }, 'No cloud-free reference covers this planet\u2019s regime.'),
    el('p', { class: 'verdict-reason' }, v.reason));
}

export function renderSummary(tbody, note, r) {
  fill(tbody, ...SUMMARY_ROWS.map(([field, label, unit]) => {
    const s = r[field];
    return el('tr', { 'data-field': field },
      el('th', { scope: 'row' }, ...subscripted(label)),
      cell(field, 'median', s.median, unit),
      intervalCell(field, s, 'lower68', 'upper68', unit),
      intervalCell(field, s, 'lower95', 'upper95', unit));
  }));
  note.dataset.constraint = r.geometricAlbedo.constraint;
  note.textContent = `${r.detected ? 'The eclipse signal is detected at 3 σ or more.' : 'The eclipse signal is below 3 σ.'} ${constraintText(r)}`;
}

/** How the data constrain the albedo, as the page states it. */
export function constraintText(r) {
  const g = r.geometricAlbedo;
  if (r.modelFit && !r.modelFit.reproducesData) return `The model cannot reproduce the data, so these numbers are not meaningful: ${r.modelFit.problems.join(' ')}`;
  if (g.constraint === 'measured') return 'Reflected light is detected: the albedo is bounded away from zero and the same for every allowed heat redistribution and phase integral.';
  if (g.constraint === 'upper-limit') return `The albedo is an upper limit: A_g < ${fmt(g.upperLimit95)} (95 %); no reflected light is detected.`;
  const allowed = r.sensitivity.filter((c) => !c.ruledOut && Number.isFinite(c.geometricAlbedo.median)).map((c) => c.geometricAlbedo.median);
  const range = allowed.length > 0 ? `between ${fmt(Math.min(...allowed))} and ${fmt(Math.max(...allowed))}` : 'anywhere in its prior';
  return `The albedo is prior-dominated: it lies ${range} depending on the assumed heat redistribution and phase integral, not on the data. An infrared eclipse or a measured dayside temperature would break the degeneracy.`;
}

/** How many candidates the table shows before "show all". */
export const LEADING_ROWS = 10;

function reasonsCell(reasons) {
  const [first, ...rest] = reasons;
  if (rest.length === 0) return el('td', { class: 'reasons-cell' }, first ?? '');
  return el('td', { class: 'reasons-cell' }, first,
    el('details', {}, el('summary', {}, `${rest.length} more`), el('ul', { class: 'reasons' }, ...rest.map((t) => el('li', {}, t)))));
}

/** `view`: "leading" (the first LEADING_ROWS not excluded), "fitting" (all not excluded) or "all". */
export function renderCandidates(tbody, countNode, r, view) {
  const fitting = r.candidates.filter((c) => c.status !== 'excluded');
  const list = view === 'all' ? r.candidates : view === 'fitting' ? fitting : fitting.slice(0, LEADING_ROWS);
  fill(tbody, ...list.map((c) =>
    el('tr', { 'data-id': c.id, 'data-status': c.status },
      el('th', { scope: 'row' }, c.name, el('span', { class: 'muted' }, ` ${c.category}`)),
      el('td', { class: `status status-${c.status}` }, el('span', { 'aria-hidden': 'true' }, `${STATUS_MARK[c.status] ?? ''} `), c.status),
      el('td', { class: 'nowrap' }, fmtRange(c.geometricAlbedoRange[0], c.geometricAlbedoRange[1])),
      el('td', { class: 'nowrap' }, fmtProbability(c.probability)),
      reasonsCell(c.reasons))));
  const excluded = r.candidates.length - fitting.length;
  const untested = fitting.filter((c) => c.status === 'untested').length;
  countNode.textContent = `${list.length} of ${r.candidates.length} catalog entries shown (${fitting.length - untested} consistent or marginal, ${untested} untested for temperature, ${excluded} excluded), ranked by the posterior probability inside each interval.`;
}

export function renderDetails(r) {
  fill(document.querySelector('#sensitivity-table tbody'), ...r.sensitivity.map((row) =>
    el('tr', {},
      el('td', {}, fmt(row.redistribution)), el('td', {}, fmt(row.phaseIntegral)),
      el('td', {}, fmt(row.geometricAlbedo.median)), el('td', {}, fmtRange(row.geometricAlbedo.lower68, row.geometricAlbedo.upper68)),
      el('td', {}, row.deltaChiSquare === null ? 'no draw fits' : `${row.ruledOut ? 'ruled out' : 'allowed'} (Δχ² = ${fmt(row.deltaChiSquare)})`))));
  const m = r.massEffects;
  fill(document.getElementById('mass-effects'), m
    ? el('p', {}, `From the masses: ellipsoidal semi-amplitude ${fmt(m.ellipsoidalPpm.median)} ppm, Doppler beaming ${fmt(m.beamingPpm.median)} ppm, RV semi-amplitude ${fmt(m.rvSemiAmplitudeMs.median)} m/s.`)
    : el('p', {}, 'No masses given: the star\u2019s ellipsoidal and beaming signals were not estimated.'));
  const w = r.requiredSingleScatteringAlbedo;
  document.getElementById('particle-note').textContent = w
    ? `A thick cloud of isotropic scatterers would need a single-scattering albedo of ${fmt(w.median)} (68 %: ${fmtRange(w.lower68, w.upper68)}); ${w.note}.`
    : '';
  fill(document.getElementById('assumption-list'), ...r.assumptions.map((a) => el('li', {}, a)));
  fill(document.getElementById('warning-list'), ...(r.warnings.length ? r.warnings.map((a) => el('li', {}, a)) : [el('li', {}, 'none')]));
}
