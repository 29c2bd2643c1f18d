/** Readable text for `hesper catalog list` and `catalog show`. */
import type { CatalogEntry, ComparisonEntry, SourceRecord } from '../../catalog/index.ts';

/** Up to four significant digits, no trailing zeros. */
export function num(v: number): string {
  return String(Number(v.toPrecision(4)));
}

export function bandText(e: CatalogEntry): string {
  return `${num(e.bandMinNm)}-${num(e.bandMaxNm)}`;
}

export function rangeText(e: CatalogEntry): string {
  return e.valueMin === e.valueMax ? num(e.valueMin) : `${num(e.valueMin)}-${num(e.valueMax)}`;
}

export function temperatureText(e: CatalogEntry): string {
  const lo = e.temperatureMinK;
  const hi = e.temperatureMaxK;
  if (lo === null && hi === null) return '';
  if (lo === null) return `<=${num(hi!)}`;
  if (hi === null) return `>=${num(lo)}`;
  return lo === hi ? num(lo) : `${num(lo)}-${num(hi)}`;
}

/** An aligned text table: a header row, a rule, then the rows. */
export function table(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: readonly string[]) =>
    cells
      .map((c, i) => (i === cells.length - 1 ? c : c.padEnd(widths[i]!)))
      .join('  ')
      .trimEnd();
  return [line(header), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n');
}

export function entryTable(list: readonly CatalogEntry[]): string {
  const header = ['ID', 'CATEGORY', 'QUANTITY', 'BAND nm', 'NOMINAL', 'RANGE', 'T K', 'PROVENANCE', 'ORIGIN'];
  const rows = list.map((e) => [e.id, e.category, e.quantity, bandText(e), num(e.valueNominal), rangeText(e), temperatureText(e), e.provenance, e.origin]);
  return table(header, rows);
}

/** Wraps text at `width` columns, indenting continuation lines. */
export function wrap(text: string, width: number, indent: string): string {
  const words = text.split(/\s+/).filter((w) => w.length > 0);
  const lines: string[] = [];
  let current = '';
  for (const w of words) {
    if (current.length > 0 && current.length + 1 + w.length > width) {
      lines.push(current);
      current = w;
    } else current = current.length > 0 ? `${current} ${w}` : w;
  }
  if (current.length > 0) lines.push(current);
  return lines.join(`\n${indent}`);
}

/** One-paragraph citation of a source record. */
export function citation(s: SourceRecord): string {
  const venue = [s.journal, s.publisher].filter(Boolean).join(', ');
  const where = [venue, s.volume, s.pages].filter(Boolean).join(' ');
  const ids = [s.doi ? `doi:${s.doi}` : '', s.arxiv ? `arXiv:${s.arxiv}` : '', s.bibcode ? `ADS:${s.bibcode}` : '', s.url ?? '']
    .filter(Boolean)
    .join(' ');
  return [`${s.authors} (${s.year ?? 'n.d.'}).`, `${s.title}.`, where ? `${where}.` : '', ids].filter(Boolean).join(' ');
}

export function entryDetail(e: CatalogEntry, sources: readonly SourceRecord[]): string {
  const pad = '               ';
  const rows: [string, string][] = [
    ['name', e.name],
    ['category', e.category],
    ['quantity', e.quantity],
    ['band', `${bandText(e)} nm`],
    ['value', `${num(e.valueNominal)} (range ${rangeText(e)})`],
    ['temperature', temperatureText(e) ? `${temperatureText(e)} K` : 'no window recorded'],
    ['condensate', e.condensate ?? '-'],
    ['provenance', e.provenance],
    ['applies to', e.appliesTo.join(', ')],
    ['origin', e.origin],
    ['description', e.description || '-'],
  ];
  if (e.spectrum) rows.push(['spectrum', e.spectrum.map((p) => `${num(p.wavelengthNm)} nm: ${num(p.value)}`).join(', ')]);
  const lines = [e.id, ...rows.map(([k, v]) => `  ${k.padEnd(12)} ${wrap(v, 76, pad)}`), '  sources'];
  for (const s of sources) {
    lines.push(`    [${s.key}] ${wrap(citation(s), 72, '      ')}`);
    if (s.note) lines.push(`      note: ${wrap(s.note, 70, '            ')}`);
  }
  return lines.join('\n');
}

/** The comparison set as an aligned table. */
export function comparisonTable(list: readonly ComparisonEntry[]): string {
  const header = ['ID', 'KIND', 'BAND nm', 'A_g NOMINAL', 'A_g RANGE', 'T_eq K', 'PROVENANCE', 'SOURCES'];
  const rows = list.map((c) => {
    const band = `${c.band.id ? `${c.band.id} ` : ''}${num(c.band.minNm)}-${num(c.band.maxNm)}`;
    const [lo, hi] = c.geometricAlbedoRange;
    const t = c.equilibriumTemperatureRangeK;
    const nominal = c.equilibriumTemperatureK === null ? '-' : num(c.equilibriumTemperatureK);
    const temperature = t ? `${nominal} (${num(t[0])}-${num(t[1])})` : nominal;
    return [c.id, c.kind, band, num(c.geometricAlbedoNominal), lo === hi ? num(lo) : `${num(lo)}-${num(hi)}`, temperature, c.provenance, c.sources.join(', ')];
  });
  return table(header, rows);
}
