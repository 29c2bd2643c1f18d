// Writes the files scripts/check-bibtex.sh feeds to real bibtex and pdflatex (into the
// folder given as the first argument): hostile.bib (source records with hostile text,
// and a DOI and a URL as an old database might hold them), catalog.bib (the whole
// curated catalog), report.tex and report.bib (the LaTeX paragraphs of the invented
// demo planet Aurelia b with hostile names, and the BibTeX of what they cite), and
// expected.json (the keys each .bib must yield).
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { HESPER_VERSION } from '../src/api/version.ts';
import { openCatalog, SEEDS_DIR, type SourceRecord } from '../src/catalog/index.ts';
import { seedHash } from '../src/catalog/seed-hash.ts';
import { interpretSystem } from '../src/interpret/run.ts';
import { loadSystemFile } from '../src/io/system-file.ts';
import { toBibtex } from '../src/report/bibtex.ts';
import { LATEX_PACKAGES, paragraphLatex, writeUpLatex } from '../src/report/paragraph-tex.ts';

const out = process.argv[2];
if (!out) throw new Error('usage: writer-fixtures.ts OUTDIR');
mkdirSync(out, { recursive: true });

const HOSTILE = [
  'real title}, year = 1999, note = x} @article(Schmid2006, author = "m", title = "forged") @comment(',
  'a}b',
  '}}}} @misc{X, title={y}}',
  'a\\}, note = {forged',
  '{{{ a',
  '", note = "forged',
  '@comment{ @article{Forged, title = {x}} }',
  '@string{jan = "forged"}',
  '@preamble{"\\input{/etc/hostname}"}',
  'x\n@article{Forged,\n  title = {y}\n}\n',
  '\\input{/etc/hostname}\\relax',
  '^^5cinput^^7b/etc/hostname^^7d',
  '\\ { } $ & # ^ _ ~ % < > | @ " \' `',
];

const base: SourceRecord = {
  key: 'Hostile00', type: 'article', authors: 'Nobody, A. and {Invented Group}', year: 2026, title: 'x', journal: 'Invented Journal',
  publisher: null, volume: '1', pages: '1-2', doi: null, arxiv: null, bibcode: null, url: null, note: null, origin: 'user',
};
const hostile: SourceRecord[] = HOSTILE.map((t, k) => ({
  ...base, key: `Hostile${String(k + 1).padStart(2, '0')}`, title: t, journal: t, note: t, volume: t.slice(0, 20),
  authors: `Nobody, A. and {${t.replace(/[{}\n]/g, ' ')}}`,
}));
// A DOI and a URL as a database written before the input rules might hold them.
hostile.push({ ...base, key: 'HostileDoi', title: 'DOI and URL with TeX in them', doi: '10.1234/x\\input/etc/hostname\\relax', url: 'https://example.org/\\input{/etc/hostname}^^5c' });

const versions = { hesperVersion: HESPER_VERSION, catalogVersion: seedHash(SEEDS_DIR) };
writeFileSync(path.join(out, 'hostile.bib'), toBibtex(hostile, versions));

const catalog = openCatalog({ path: path.join(out, 'catalog.sqlite'), env: {} });
const sources = catalog.listSources();
const data = { entries: catalog.listEntries(), condensates: catalog.listCondensates() };
catalog.close();
writeFileSync(path.join(out, 'catalog.bib'), toBibtex(sources, versions));

// The demo planet (invented) with hostile text in its name and in every candidate name.
const system = loadSystemFile(new URL('../demo-data/systems/aurelia-b.json', import.meta.url).pathname, process.cwd());
const i = JSON.parse(JSON.stringify(interpretSystem(system, { catalog: data, samples: 1000, seed: 7 })));
const evil = '\\input{/etc/hostname} ^^5cinput $x$ % # & _ ~ < > | @ {';
i.name = `Aurelia b ${evil}`;
for (const c of i.candidates) c.name = `${evil} ${c.id}`;
const w = writeUpLatex(i, system, sources);
writeFileSync(path.join(out, 'report.bib'), toBibtex(w.citations.citedSources(), versions));
const preamble = LATEX_PACKAGES.map((p) => p.line).join('\n');
writeFileSync(
  path.join(out, 'report.tex'),
  `\\documentclass{article}\n${preamble}\n\\begin{document}\n${paragraphLatex(i, system, sources, versions)}\n\\bibliographystyle{plainnat}\n\\bibliography{report}\n\\end{document}\n`,
);

writeFileSync(path.join(out, 'expected.json'), JSON.stringify({
  hostile: hostile.map((s) => s.key),
  catalog: sources.map((s) => s.key),
  report: w.citations.citedKeys(),
}, null, 2));
process.stdout.write(`wrote the fixtures to ${out}\n`);
