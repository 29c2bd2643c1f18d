/**
 * Citations for the write-up: author-year labels from catalog source records, and the
 * method papers the interpretation rests on. A method paper is cited by its catalog
 * key when the catalog has it (matched by first author and year), else written out as
 * text, so every \citep key of the LaTeX output is in the BibTeX file.
 */
import type { SourceRecord } from '../catalog/index.ts';
import { splitNames } from './bibtex.ts';

/** A citation: a catalog key, or a reference written out (a method paper the catalog lacks). */
export type Ref = { key: string } | { text: string };

function surname(name: string): string {
  const plain = name.replace(/[{}]/g, '').trim();
  if (plain.includes(',')) return plain.split(',')[0]!.trim();
  const words = plain.split(/\s+/);
  return words[words.length - 1] ?? plain;
}

/** "Demory et al.", "Kitzmann & Heng", "Chandrasekhar", "Wikipedia contributors". */
export function authorLabel(authors: string): string {
  const names = splitNames(authors);
  const corporate = names.length === 1 && /^\{.*\}$/.test(names[0]!.trim());
  if (corporate) return names[0]!.trim().slice(1, -1);
  const last = names.map(surname);
  if (last.length >= 3 || last.includes('others')) return `${last[0]} et al.`;
  if (last.length === 2) return `${last[0]} & ${last[1]}`;
  return last[0] ?? authors;
}

/** "Demory et al. 2013". */
export function authorYear(s: SourceRecord): string {
  return `${authorLabel(s.authors)} ${s.year ?? 'n.d.'}`;
}

export interface MethodPaper {
  firstAuthor: string;
  year: number;
  /** How the paper is written when the catalog lacks it. */
  text: string;
}

/** The method papers of the interpretation (bibliographic details in seeds/sources.json). */
export const METHOD_PAPERS = {
  cowanAgol: { firstAuthor: 'Cowan', year: 2011, text: 'Cowan & Agol 2011, ApJ 729, 54' },
  fulton: { firstAuthor: 'Fulton', year: 2017, text: 'Fulton et al. 2017, AJ 154, 109' },
  chandrasekhar: { firstAuthor: 'Chandrasekhar', year: 1960, text: 'Chandrasekhar 1960, Radiative Transfer' },
  demory2013: { firstAuthor: 'Demory', year: 2013, text: 'Demory et al. 2013, ApJ 776, L25' },
  parmentier: { firstAuthor: 'Parmentier', year: 2016, text: 'Parmentier et al. 2016, ApJ 828, 22' },
  kitzmannHeng: { firstAuthor: 'Kitzmann', year: 2018, text: 'Kitzmann & Heng 2018, MNRAS 475, 94' },
} as const satisfies Record<string, MethodPaper>;

export class Citations {
  private readonly byKey: Map<string, SourceRecord>;
  private readonly used: string[] = [];

  constructor(sources: readonly SourceRecord[]) {
    this.byKey = new Map(sources.map((s) => [s.key, s]));
  }

  /** Keys present in the catalog (unknown keys are dropped: they cannot be put in the BibTeX file). */
  keys(keys: readonly string[]): Ref[] {
    return keys.filter((k) => this.byKey.has(k)).map((key) => ({ key }));
  }

  /** A method paper: its catalog key when the catalog has it, else the written-out reference. */
  method(paper: MethodPaper): Ref {
    for (const s of this.byKey.values()) {
      const first = splitNames(s.authors)[0];
      if (s.year === paper.year && first !== undefined && surname(first).toLowerCase() === paper.firstAuthor.toLowerCase()) return { key: s.key };
    }
    return { text: paper.text };
  }

  source(key: string): SourceRecord | undefined {
    return this.byKey.get(key);
  }

  /** Records a citation's keys in first-use order (for the BibTeX file). */
  note(refs: readonly Ref[]): void {
    for (const r of refs) if ('key' in r && !this.used.includes(r.key)) this.used.push(r.key);
  }

  /** Every key cited so far, in order of first use. */
  citedKeys(): string[] {
    return [...this.used];
  }

  citedSources(): SourceRecord[] {
    return this.used.map((k) => this.byKey.get(k)!);
  }
}
