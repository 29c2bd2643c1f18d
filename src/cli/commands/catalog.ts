/**
 * `hesper catalog ...`: list, show, comparisons, add, import, export, bib, seed, remove. Every
 * subcommand takes --db PATH (else HESPER_DB, else db/hesper.sqlite); the database is
 * created, migrated and seeded on first use.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Command, Option } from 'commander';
// Read commands load only the zod-free reader; write commands import the full catalog
// when they run, so `catalog list` starts quickly.
import type { Catalog } from '../../catalog/catalog.ts';
import { csvColumnsHelp } from '../../catalog/csv-columns.ts';
import { EXPORT_FORMATS, openCatalogReader, type CatalogReader } from '../../catalog/reader.ts';
import { CATEGORIES, ORIGINS } from '../../catalog/vocab.ts';
import { inputError } from '../../errors.ts';
import { toBibtex } from '../../report/bibtex.ts';
import type { CliIo } from '../io.ts';
import { comparisonTable, entryDetail, entryTable } from './catalog-format.ts';

const DB_HELP = 'catalog database file (default: $HESPER_DB, else db/hesper.sqlite in the hesper folder)';

interface DbOption {
  db?: string;
}

/** Opens the catalog for reading for one command and always closes it. */
export async function withCatalog<T>(io: CliIo, opts: DbOption, work: (c: CatalogReader) => T | Promise<T>): Promise<T> {
  const catalog = await openCatalogReader({ path: opts.db, env: io.env, cwd: io.cwd });
  try {
    return await work(catalog);
  } finally {
    catalog.close();
  }
}

/** Opens the full catalog (changes allowed) for one command and always closes it. */
export async function withWritableCatalog<T>(io: CliIo, opts: DbOption, work: (c: Catalog) => T | Promise<T>): Promise<T> {
  const { openCatalog } = await import('../../catalog/catalog.ts');
  const catalog = openCatalog({ path: opts.db, env: io.env, cwd: io.cwd });
  try {
    return await work(catalog);
  } finally {
    catalog.close();
  }
}

/** Reads a text file named on the command line (relative to the working directory). */
export function readTextFile(io: CliIo, file: string, option: string): string {
  const full = path.resolve(io.cwd, file);
  try {
    return readFileSync(full, 'utf8');
  } catch (e) {
    throw inputError('file-unreadable', option, `cannot read ${full}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`, file);
  }
}

function registerRead(catalog: Command, io: CliIo): void {
  catalog
    .command('list')
    .description('list catalog entries as an aligned table (or JSON)')
    .addOption(new Option('--category <name>', 'only this category').choices(CATEGORIES))
    .option('--search <text>', 'only entries whose id, name, description, condensate or sources contain the text')
    .option('--json', 'print the entries as a JSON array (catalog-entry format)')
    .option('--db <path>', DB_HELP)
    .action(async (opts: DbOption & { category?: string; search?: string; json?: boolean }) => {
      await withCatalog(io, opts, (c) => {
        const list = c.listEntries({ category: opts.category, search: opts.search });
        if (opts.json) io.out(JSON.stringify(list, null, 2));
        else {
          io.out(entryTable(list));
          io.err(`${list.length} entr${list.length === 1 ? 'y' : 'ies'}`);
        }
      });
    });

  catalog
    .command('show')
    .description('show one entry with its sources')
    .argument('<id>', 'entry id')
    .option('--json', 'print the entry as JSON (catalog-entry format)')
    .option('--db <path>', DB_HELP)
    .action(async (id: string, opts: DbOption & { json?: boolean }) => {
      await withCatalog(io, opts, (c) => {
        const entry = c.getEntry(id);
        io.out(opts.json ? JSON.stringify(entry, null, 2) : entryDetail(entry, c.getSources(entry.sources)));
      });
    });

  catalog
    .command('comparisons')
    .description('list the comparison set: measured geometric albedos of named exoplanets and of planet populations (not candidate materials)')
    .option('--json', 'print the comparison rows as a JSON array')
    .option('--db <path>', DB_HELP)
    .action(async (opts: DbOption & { json?: boolean }) => {
      await withCatalog(io, opts, (c) => {
        const list = c.listComparisons();
        if (opts.json) io.out(JSON.stringify(list, null, 2));
        else {
          io.out(comparisonTable(list));
          io.err(`${list.length} comparison row${list.length === 1 ? '' : 's'}`);
        }
      });
    });

  catalog
    .command('export')
    .description('write entries to stdout: csv (the import format plus origin) or json (entries with full source records)')
    .addOption(new Option('--format <format>', 'output format').choices(EXPORT_FORMATS).makeOptionMandatory())
    .addOption(new Option('--origin <origin>', 'only curated or only user entries').choices(ORIGINS))
    .addOption(new Option('--category <name>', 'only this category').choices(CATEGORIES))
    .option('--db <path>', DB_HELP)
    .action(async (opts: DbOption & { format: 'json' | 'csv'; origin?: string; category?: string }) => {
      await withCatalog(io, opts, (c) => io.out(c.exportEntries(opts.format, { origin: opts.origin, category: opts.category }).trimEnd()));
    });

  catalog
    .command('bib')
    .description('print BibTeX for all sources, or for the keys named')
    .argument('[keys...]', 'source keys (default: all)')
    .option('--db <path>', DB_HELP)
    .action(async (keys: string[], opts: DbOption) => {
      await withCatalog(io, opts, (c) => io.out(toBibtex(keys.length > 0 ? c.getSources(keys) : c.listSources()).trimEnd()));
    });
}

function registerWrite(catalog: Command, io: CliIo): void {
  catalog
    .command('add')
    .description('add user entries from a JSON file (one catalog entry, or an array of them)')
    .requiredOption('--file <entry.json>', 'catalog-entry JSON; sources are existing keys or full source records')
    .option('--db <path>', DB_HELP)
    .action(async (opts: DbOption & { file: string }) => {
      const text = readTextFile(io, opts.file, '--file');
      let json: unknown;
      try {
        json = JSON.parse(text);
      } catch (e) {
        throw inputError('invalid-input', '--file', `${opts.file} is not valid JSON: ${(e as Error).message}`, opts.file);
      }
      await withWritableCatalog(io, opts, (c) => {
        const added = Array.isArray(json) ? c.addUserEntries(json) : [c.addUserEntry(json)];
        for (const e of added) io.out(`added ${e.id}`);
      });
    });

  catalog
    .command('import')
    .description('import user entries from a CSV file in one transaction: all rows or none')
    .argument('<file.csv>', 'CSV file with a header row')
    .option('--db <path>', DB_HELP)
    .addHelpText(
      'after',
      `\nCSV columns (header names, any order; an "origin" column is accepted and ignored):\n${csvColumnsHelp()}\n\n` +
        'Every bad row is reported with its line number and column; nothing is imported unless every row is valid.',
    )
    .action(async (file: string, opts: DbOption) => {
      const text = readTextFile(io, file, 'file');
      await withWritableCatalog(io, opts, (c) => {
        const report = c.importCsv(text);
        io.out(`imported ${report.imported} entr${report.imported === 1 ? 'y' : 'ies'}: ${report.ids.join(', ')}`);
      });
    });

  catalog
    .command('seed')
    .description('re-apply the curated seeds (seeds/*.json); user entries are never changed')
    .option('--db <path>', DB_HELP)
    .action(async (opts: DbOption) => {
      await withWritableCatalog(io, opts, (c) => {
        const r = c.seededOnOpen ?? c.reseed();
        io.out(
          `seeded ${r.entries} entries, ${r.sources} sources and ${r.condensates} condensation curves from ${r.files.length} files ` +
            `(${r.changedEntries} entries and ${r.changedSources} sources new or changed; ${r.removedEntries} entries and ${r.removedSources} sources retired)`,
        );
        if (r.skippedForUserRows.length > 0) io.err(`kept user rows instead of seed rows: ${r.skippedForUserRows.join(', ')}`);
      });
    });

  catalog
    .command('remove')
    .description('remove a user entry (curated entries cannot be removed)')
    .argument('<id>', 'entry id')
    .option('--db <path>', DB_HELP)
    .action(async (id: string, opts: DbOption) => {
      await withWritableCatalog(io, opts, (c) => io.out(`removed ${c.removeUserEntry(id).id}`));
    });
}

export function registerCatalog(program: Command, io: CliIo): void {
  const catalog = program
    .command('catalog')
    .description('the sourced reference catalog of reflectivities (created, migrated and seeded on first use)');
  registerRead(catalog, io);
  registerWrite(catalog, io);
}
