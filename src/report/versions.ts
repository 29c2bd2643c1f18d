/**
 * The versions a write-up records in a comment line: the hesper version (package.json)
 * and the catalog version (a hash of the curated seeds, shown by its first 12 hex
 * digits). Both are reduced to a plain character set, so the line can end neither a TeX
 * comment, nor an HTML comment, nor start a BibTeX entry.
 */

export interface WriterVersions {
  hesperVersion?: string | undefined;
  catalogVersion?: string | undefined;
}

/** Hex digits of the catalog hash shown (48 bits: enough to tell catalogs apart by eye). */
const CATALOG_DIGITS = 12;

function plain(text: string | undefined, allowed: RegExp, max: number): string | undefined {
  if (text === undefined) return undefined;
  const kept = [...text].filter((c) => allowed.test(c)).join('').slice(0, max);
  return kept === '' ? undefined : kept;
}

/** "written by hesper 0.2.0, catalog 1a2b3c4d5e6f" ("not recorded" for a version not given). */
export function versionLine(v: WriterVersions): string {
  const hesper = plain(v.hesperVersion, /[0-9A-Za-z.+-]/, 40);
  const catalog = plain(v.catalogVersion, /[0-9A-Za-z]/, CATALOG_DIGITS);
  return `written by hesper ${hesper ?? '(version not recorded)'}, catalog ${catalog ?? '(version not recorded)'}`;
}
