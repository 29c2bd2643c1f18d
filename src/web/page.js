// The page: loads the bands and demos, runs POST /api/report for the system in the
// form or the text box, and shows the result; starts the catalog browser.
import { api } from './api-client.js';
import { startCatalogBrowser } from './catalog-browser.js';
import { drawFigure } from './figure.js';
import { download, el, fileStem, fill } from './format.js';
import { renderCandidates, renderDetails, renderSummary, renderVerdict } from './result-view.js';
import { SystemForm } from './system-form.js';

const $ = (id) => document.getElementById(id);

const state = { form: undefined, report: undefined, lastSystem: undefined, running: false };

function mode() {
  return document.querySelector('input[name="input-mode"]:checked').value;
}

function format() {
  return document.querySelector('input[name="report-format"]:checked').value;
}

function setStatus(text, kind = '') {
  const s = $('run-status');
  s.textContent = text;
  s.dataset.kind = kind;
}

function showMode(m) {
  $('form-fields').hidden = m !== 'form';
  $('kept-fields').hidden = m !== 'form' || $('kept-fields').childElementCount === 0;
  $('file-box').hidden = m !== 'file';
}

/** Switching modes carries the system across; a text that is not JSON stays in the text box. */
function switchMode(next) {
  clearProblems();
  if (next === 'file') {
    $('system-text').value = JSON.stringify(state.form.read(), null, 2);
  } else {
    try {
      state.form.load(JSON.parse($('system-text').value || '{}'));
    } catch (e) {
      document.querySelector('input[name="input-mode"][value="file"]').checked = true;
      showFileIssues([{ path: 'system file', message: `cannot be shown as form fields: not valid JSON (${e.message})` }]);
      return;
    }
  }
  showMode(next);
}

function clearProblems() {
  state.form.clearIssues();
  fill($('system-text-errors'));
  $('system-text').removeAttribute('aria-invalid');
  $('problem-box').hidden = true;
}

function issueItem(i) {
  return el('li', { 'data-path': i.path }, el('code', {}, i.path), ': ', i.message);
}

function showFileIssues(issues) {
  fill($('system-text-errors'), ...issues.map(issueItem));
  $('system-text').setAttribute('aria-invalid', 'true');
}

function showProblems(error, status) {
  const issues = error?.issues ?? [];
  const box = $('problem-box');
  const count = issues.length;
  $('problem-title').textContent = count > 0
    ? `The system has ${count} problem${count === 1 ? '' : 's'}${mode() === 'form' ? ' (marked at the fields)' : ''}`
    : `The server refused the request (${status}): ${error?.message ?? 'no reason given'}`;
  fill($('problem-list'), ...issues.map(issueItem));
  box.hidden = false;
  if (mode() === 'form') {
    const { first } = state.form.showIssues(issues);
    (first ?? box).focus();
  } else {
    showFileIssues(issues);
    box.focus();
  }
}

/** Marks the shown result as belonging to an earlier system (or clears the mark). */
function markStale(text) {
  if (!state.report) return;
  $('result').dataset.stale = text ? 'true' : 'false';
  $('stale-note').hidden = !text;
  $('stale-note').textContent = text ?? '';
}

async function showReport(report) {
  const r = report.interpretation;
  $('result-empty').hidden = true;
  $('result').hidden = false;
  markStale(undefined);
  renderVerdict($('verdict'), r);
  renderSummary(document.querySelector('#summary-table tbody'), $('detection-note'), r);
  renderCandidates(document.querySelector('#candidates-table tbody'), $('candidates-count'), r, $('candidate-view').value);
  renderDetails(r);
  showWriteUp(report);
  $('figure-caption').textContent = `Top: the posterior of A_g in the ${r.band.label} band. Below: the candidates' intervals converted to A_g; the dashed line is the cloud-free ceiling.`;
  await drawFigure($('figure'), report.figure.vegaLite);
}

function showWriteUp(report) {
  $('paragraph').textContent = report.text;
  $('paragraph').dataset.format = report.format;
  $('copy-status').textContent = '';
}

async function run(event) {
  event?.preventDefault();
  if (state.running) return;
  state.running = true;
  $('run-button').disabled = true;
  clearProblems();
  const system = mode() === 'file' ? $('system-text').value : state.form.read();
  setStatus('Working out the albedo…', 'busy');
  const t0 = performance.now();
  try {
    const res = await api.report(system, format());
    if (!res.ok) {
      setStatus(res.status === 400 || res.status === 413 || res.status === 415 ? 'Not interpreted: see the problems below.' : `Not interpreted: the server answered ${res.status}.`, 'error');
      showProblems(res.body?.error, res.status);
      markStale(`This result is for ${state.report?.interpretation.name}; the system now in the form was not interpreted.`);
      return;
    }
    state.report = res.body;
    state.lastSystem = system;
    await showReport(res.body);
    setStatus(`Done in ${((performance.now() - t0) / 1000).toFixed(1)} s: ${res.body.interpretation.name}.`, 'done');
  } finally {
    state.running = false;
    $('run-button').disabled = false;
  }
}

async function changeFormat() {
  if (!state.lastSystem) return;
  $('copy-status').textContent = 'Writing…';
  const res = await api.report(state.lastSystem, format());
  if (res.ok) {
    state.report = res.body;
    showWriteUp(res.body);
  } else {
    $('copy-status').textContent = `Could not rewrite (${res.status}).`;
  }
}

async function copyParagraph() {
  const text = $('paragraph').textContent;
  try {
    await navigator.clipboard.writeText(text);
    $('copy-status').textContent = 'Copied to the clipboard.';
  } catch {
    const range = document.createRange();
    range.selectNodeContents($('paragraph'));
    const sel = getSelection();
    sel.removeAllRanges();
    sel.addRange(range);
    $('copy-status').textContent = 'Selected: press Ctrl+C (⌘C) to copy.';
  }
}

async function loadDemo() {
  const name = $('demo-select').value;
  if (!name) return;
  const res = await api.demo(name);
  if (!res.ok) {
    setStatus(`Could not load the demo (${res.status}).`, 'error');
    return;
  }
  clearProblems();
  state.form.load(res.body);
  $('system-text').value = JSON.stringify(res.body, null, 2);
  showMode(mode());
  setStatus(`Loaded the invented demo system ${res.body.name}. Press Interpret.`, 'ready');
  markStale(`This result is for ${state.report?.interpretation.name}; press Interpret for ${res.body.name}.`);
}

async function start() {
  const [bands, demos] = await Promise.all([api.bands(), api.demos()]);
  state.form = new SystemForm($('form-fields'), $('kept-fields'), bands.ok ? bands.body : []);
  if (demos.ok) {
    fill($('demo-select'), ...demos.body.map((d) => el('option', { value: d.name, title: d.note }, d.title)));
    const note = () => {
      const d = demos.body.find((x) => x.name === $('demo-select').value);
      $('demo-note').textContent = d?.note || 'Demo systems are invented, not real planets.';
    };
    $('demo-select').addEventListener('change', note);
    note();
  }
  $('load-demo').addEventListener('click', loadDemo);
  $('system-form').addEventListener('submit', run);
  for (const r of document.querySelectorAll('input[name="input-mode"]')) r.addEventListener('change', () => switchMode(r.value));
  for (const r of document.querySelectorAll('input[name="report-format"]')) r.addEventListener('change', changeFormat);
  $('candidate-view').addEventListener('change', () => {
    if (state.report) renderCandidates(document.querySelector('#candidates-table tbody'), $('candidates-count'), state.report.interpretation, $('candidate-view').value);
  });
  $('copy-paragraph').addEventListener('click', copyParagraph);
  $('download-bib').addEventListener('click', () => {
    if (state.report) download(state.report.bibtex, `${fileStem(state.report.interpretation.name)}.bib`, 'application/x-bibtex');
  });
  $('figure-download').addEventListener('click', () => {
    if (state.report) download(state.report.figure.svg, `${fileStem(state.report.interpretation.name)}-albedo.svg`, 'image/svg+xml');
  });
  showMode(mode());
  document.body.dataset.ready = 'true';
  await startCatalogBrowser();
}

// The figure library is loaded with defer; module scripts run after it.
start().catch((e) => setStatus(`The page could not start: ${e.message}`, 'error'));
