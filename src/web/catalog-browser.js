// The catalog browser: search text, category and origin filters, answered by
// GET /api/catalog/entries.
import { api } from './api-client.js';
import { el, fill, fmt } from './format.js';

function range(lo, hi) {
  if (lo === null && hi === null) return 'any';
  if (lo === null) return `≤ ${fmt(hi)}`;
  if (hi === null) return `≥ ${fmt(lo)}`;
  return `${fmt(lo)} – ${fmt(hi)}`;
}

function row(e) {
  return el('tr', { 'data-id': e.id },
    el('th', { scope: 'row' }, e.name, el('span', { class: 'muted block' }, e.id, e.origin === 'user' ? ' · yours' : '')),
    el('td', {}, e.category),
    el('td', {}, e.quantity),
    el('td', { class: 'nowrap' }, `${fmt(e.valueNominal)} (${fmt(e.valueMin)} – ${fmt(e.valueMax)})`),
    el('td', { class: 'nowrap' }, `${fmt(e.bandMinNm)} – ${fmt(e.bandMaxNm)}`),
    el('td', { class: 'nowrap' }, e.condensate ? `${range(e.temperatureMinK, e.temperatureMaxK)}; ${e.condensate}` : range(e.temperatureMinK, e.temperatureMaxK)),
    el('td', {}, e.provenance),
    el('td', { class: 'sources' }, e.sources.join(', ')));
}

export async function startCatalogBrowser() {
  const search = document.getElementById('catalog-search');
  const category = document.getElementById('catalog-category');
  const origin = document.getElementById('catalog-origin');
  const count = document.getElementById('catalog-count');
  const tbody = document.querySelector('#catalog-table tbody');
  let seq = 0;

  async function refresh() {
    const mine = ++seq;
    count.textContent = 'Looking…';
    const res = await api.entries({ search: search.value.trim(), category: category.value, origin: origin.value });
    if (mine !== seq) return;
    if (!res.ok) {
      count.textContent = res.body?.error?.issues?.map((i) => `${i.path}: ${i.message}`).join('; ') || `The catalog did not answer (${res.status}).`;
      fill(tbody);
      return;
    }
    fill(tbody, ...res.body.map(row));
    count.textContent = `${res.body.length} entr${res.body.length === 1 ? 'y' : 'ies'}${search.value.trim() ? ` matching “${search.value.trim()}”` : ''}${category.value ? ` in ${category.value}` : ''}.`;
  }

  const all = await api.entries({});
  if (all.ok) {
    const categories = [...new Set(all.body.map((e) => e.category))].sort();
    category.append(...categories.map((c) => el('option', { value: c }, c)));
  }
  let timer;
  search.addEventListener('input', () => {
    clearTimeout(timer);
    timer = setTimeout(refresh, 200);
  });
  category.addEventListener('change', refresh);
  origin.addEventListener('change', refresh);
  await refresh();
}
