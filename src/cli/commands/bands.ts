/**
 * `hesper bands [--json]`: the built-in bands with their coverage, shape, source and
 * whether they are approximate. The table is for people; --json gives the same data as
 * an array of band descriptions (the form GET /api/bands uses).
 */
import type { Command } from 'commander';
import { describeBand, listBuiltinBands, type BandDescription } from '../../physics/bandpass.ts';
import { renderTable } from '../../report/table.ts';
import type { CliIo } from '../io.ts';

function range(lo: number, hi: number): string {
  return `${lo}-${hi}`;
}

/** The aligned text table of bands, with a short legend. */
export function formatBandTable(bands: BandDescription[]): string {
  const header = ['id', 'band', 'coverage (nm)', 'half max (nm)', 'shape', 'approximate', 'source'];
  const rows = bands.map((b) => [
    b.id,
    b.label,
    range(b.minNm, b.maxNm),
    b.halfMaxNm ? range(b.halfMaxNm[0], b.halfMaxNm[1]) : '-',
    b.shape,
    b.approximate ? 'yes' : 'no',
    b.source,
  ]);
  const legend = [
    '',
    `${bands.length} built-in bands. Approximate = a top-hat or trapezoid built from published coverage,`,
    'not the tabulated instrument response. For precise work give the response curve instead:',
    '  "band": { "response": [[nm, weight], ...] }  or a CSV file with header wavelength_nm,weight.',
    'Band fluxes are photon-weighted by default. `hesper bands --json` adds the notes on each band.',
  ];
  return [renderTable(header, rows), ...legend].join('\n');
}

export function registerBands(program: Command, io: CliIo): void {
  program
    .command('bands')
    .description('list the built-in bands with their coverage, source and whether they are approximate')
    .option('--json', 'print the bands as JSON')
    .action((options: { json?: boolean }) => {
      const bands = listBuiltinBands().map(describeBand);
      io.out(options.json ? JSON.stringify(bands, null, 2) : formatBandTable(bands));
    });
}
