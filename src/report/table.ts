/** Plain-text tables with aligned columns, for terminal reports. */

export function renderTable(header: string[], rows: string[][], align: Array<'left' | 'right'> = []): string {
  const all = [header, ...rows];
  const widths = header.map((_, c) => Math.max(...all.map((r) => (r[c] ?? '').length)));
  const cell = (text: string, c: number) => ((align[c] ?? 'left') === 'right' ? text.padStart(widths[c]!) : text.padEnd(widths[c]!));
  const line = (r: string[]) => r.map((t, c) => cell(t, c)).join('  ').trimEnd();
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

/** A number with `digits` significant figures, without exponent for ordinary sizes. */
export function fmtSig(x: number, digits = 3): string {
  if (!Number.isFinite(x)) return Number.isNaN(x) ? 'n/a' : String(x);
  if (x === 0) return '0';
  const mag = Math.floor(Math.log10(Math.abs(x)));
  if (mag >= 6 || mag < -4) return x.toExponential(digits - 1);
  const decimals = Math.max(0, digits - 1 - mag);
  return x.toFixed(decimals);
}
