/**
 * The text hesper ships says the thing itself or cites a published source: it never
 * points at documents that are not part of the project (the team's notes and their
 * sections, tables and row codes, file names, issue numbers). Scanned: README.md,
 * DEVELOPERS.md, the JSON Schema of the system file, the OpenAPI document (generated
 * here), the --help of every command and subcommand (run in-process), and every file
 * of src/, bench/ and bin/ (code, comments and strings). The curated seeds are scanned
 * by their own test. A hit names the file (or document) and the line.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import type { Command } from 'commander';
import { describe, expect, it } from 'vitest';
import { openApiDocument } from '../src/api/openapi.ts';
import type { CliIo } from '../src/cli/io.ts';
import { main } from '../src/cli/main.ts';
import { buildProgram } from '../src/cli/program.ts';

const root = new URL('../', import.meta.url).pathname;

/** A pointer at a document outside the project, and what to write instead. */
interface Rule {
  name: string;
  pattern: RegExp;
  /** When set, a hit is accepted if the text just before it names a published source. */
  citable?: boolean;
}

const RULES: Rule[] = [
  { name: 'the design notes ("DESIGN")', pattern: /\bDESIGN\b/g },
  { name: 'a notes file name', pattern: /\b(?:STYLE|DESIGN|reflectivity|physics)\.md\b/gi },
  { name: 'the notes folder ("reference/")', pattern: /(?<![\w./-])(?:shared\/)?reference\//g },
  { name: 'the shared folder', pattern: /(?<![\w./-])shared\/\w/g },
  { name: '"the contract"', pattern: /\bthe (?:JSON )?contract\b|\bcontract JSON\b/gi },
  { name: 'an issue number', pattern: /\bissues?\s*#?\d+/gi },
  { name: 'a style-habit number', pattern: /\bhabits?\s+\d+/gi },
  { name: 'a section number', pattern: /\bsections?\s+\d+(?:\.\d+)*[a-z]?\b/gi, citable: true },
  { name: 'a table number', pattern: /\btables?\s+\d+[a-z]?\b/gi, citable: true },
  { name: 'a row number', pattern: /\brows?\s+[A-Z]{0,2}\d+[a-z]?\b(?!\s*(?:of|in) the (?:CSV|file))/gi, citable: true },
  // Row codes of the notes' tables: one of C R S T X and a number. Not codes: T0 (the
  // irradiation temperature and the mid-transit epoch, so written in the literature),
  // T1 (the LaTeX font encoding), C0 and C1 (the Unicode control-character sets).
  { name: 'a row code', pattern: /\b(?!(?:T0|T1|C0|C1)\b)[CRSTX]\d{1,2}[a-z]?\b/g },
];

/**
 * A published source named just before a section, table or row number: a year, an RFC,
 * an edition, a web address, or a paper's volume and page ("ApJ 776, L25").
 */
const CITATION_BEFORE = /(?:\b1[6-9]\d\d\b|\b20\d\d\b|\bRFC\s*\d+|\bed\.|\b[\w-]+\.(?:org|com|gov|edu|int|html?)\b)[^\n]*(?:\n[^\n]*)?$/;

interface Hit {
  where: string;
  line: number;
  rule: string;
  text: string;
}

function scan(where: string, text: string): Hit[] {
  const hits: Hit[] = [];
  for (const rule of RULES) {
    for (const m of text.matchAll(rule.pattern)) {
      const at = m.index!;
      if (rule.citable) {
        const before = text.slice(Math.max(0, at - 160), at);
        const paragraph = before.split(/\n\s*\n|\n\s*\*\s*\n/).pop()!;
        if (CITATION_BEFORE.test(paragraph)) continue;
      }
      const line = text.slice(0, at).split('\n').length;
      hits.push({ where, line, rule: rule.name, text: text.split('\n')[line - 1]!.trim().slice(0, 160) });
    }
  }
  return hits;
}

const report = (hits: Hit[]) => hits.map((h) => `${h.where}:${h.line}: ${h.rule}: ${h.text}`);

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const full = path.join(dir, f);
    if (statSync(full).isDirectory()) return filesUnder(full);
    return /\.(ts|mjs|js|json|html|css|md|txt|sql|svg)$/.test(f) ? [full] : [];
  });
}

/** Every command path of the CLI: [], ['catalog'], ['catalog', 'add'], ... */
function commandPaths(cmd: Command, prefix: string[] = []): string[][] {
  return [prefix, ...cmd.commands.flatMap((c) => commandPaths(c, [...prefix, c.name()]))];
}

async function helpOf(argv: string[]): Promise<{ code: number; text: string }> {
  let text = '';
  const io: CliIo = { out: (t) => { text += t; }, err: (t) => { text += t; }, cwd: root, env: {} };
  const code = await main([...argv, '--help'], io);
  return { code, text };
}

describe('the rules catch what they are for', () => {
  it('flags each kind of pointer and accepts published sources', () => {
    const bad = [
      'as in DESIGN section 7', 'see STYLE.md', 'from reference/reflectivity.md', 'shared/reference/physics.md', 'print the contract JSON',
      'issue 5: from the curve', 'issue #12', 'STYLE habit 10', 'rows X14 and X22', 'in table 4a', '(S28)', 'row C3', 'section 7 of the notes',
    ];
    for (const b of bad) expect(scan('example', b), b).not.toEqual([]);
    const good = [
      'Schmid, Joos & Tschan 2006, A&A 452, 657, Table 3', 'Press et al., Numerical Recipes, 3rd ed. 2007,\n * section 15.4', 'RFC 3986, section 3.2.1',
      'sqlite.org/lang_altertable.html, section 7', 'the epoch T0', '[T1]{fontenc}', 'C0 and C1 controls', 'H2O, CH4 and NH3', 'a design choice', 'https://example.org/reference/x',
    ];
    for (const g of good) expect(scan('example', g), g).toEqual([]);
  });
});

describe('shipped text has no pointers at documents outside the project', () => {
  it('README.md and DEVELOPERS.md', () => {
    const hits = ['README.md', 'DEVELOPERS.md'].flatMap((f) => scan(f, readFileSync(path.join(root, f), 'utf8')));
    expect(report(hits)).toEqual([]);
  });

  it('the JSON Schema of the system file and the OpenAPI document', () => {
    const schema = readFileSync(path.join(root, 'src/io/system-file.schema.json'), 'utf8');
    const openapi = JSON.stringify(openApiDocument(), null, 2);
    expect(openapi.length).toBeGreaterThan(10000);
    expect(report([...scan('src/io/system-file.schema.json', schema), ...scan('OpenAPI document', openapi)])).toEqual([]);
  });

  it('the --help of every command and subcommand', async () => {
    const program = await buildProgram({ out: () => {}, err: () => {}, cwd: root, env: {} });
    const paths = commandPaths(program).filter((p) => p[p.length - 1] !== 'help');
    expect(paths.length).toBeGreaterThan(10);
    const hits: Hit[] = [];
    for (const p of paths) {
      const { code, text } = await helpOf(p);
      expect(code, p.join(' ')).toBe(0);
      expect(text, p.join(' ')).toMatch(/Usage: hesper/);
      hits.push(...scan(`hesper ${[...p, '--help'].join(' ')}`, text));
    }
    expect(report(hits)).toEqual([]);
  });

  it('every file of src/, bench/ and bin/', () => {
    const files = ['src', 'bench', 'bin'].flatMap((d) => filesUnder(path.join(root, d)));
    expect(files.length).toBeGreaterThan(100);
    const hits = files.flatMap((f) => scan(path.relative(root, f), readFileSync(f, 'utf8')));
    expect(report(hits)).toEqual([]);
  });
});
