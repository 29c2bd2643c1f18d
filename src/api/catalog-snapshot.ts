/**
 * The catalog data an interpretation matches against, read from the database once and
 * again only when it may have changed: after a change made through the API, or when
 * the catalog's counts or seed version differ (another process added, removed or
 * re-seeded rows). The version lets worker threads keep their copy between requests.
 */
import type { Catalog } from '../catalog/index.ts';
import type { CatalogSnapshot } from '../batch/messages.ts';

export class CatalogSnapshots {
  private readonly catalog: Catalog;
  private generation = 0;
  private snapshot: (CatalogSnapshot & { fingerprint: string }) | undefined;

  constructor(catalog: Catalog) {
    this.catalog = catalog;
  }

  private fingerprint(): string {
    const s = this.catalog.stats();
    return [this.generation, s.entries, s.userEntries, s.sources, s.condensates, s.seedHash ?? ''].join(':');
  }

  /** The current data, re-read when the fingerprint changed. */
  current(): CatalogSnapshot {
    const fp = this.fingerprint();
    let snapshot = this.snapshot;
    if (snapshot?.fingerprint !== fp) {
      snapshot = this.snapshot = {
        fingerprint: fp,
        version: `${Date.now().toString(36)}-${fp}`,
        data: { entries: this.catalog.listEntries(), condensates: this.catalog.listCondensates() },
        sources: this.catalog.listSources(),
      };
    }
    return snapshot;
  }

  /** Call after any change made through this process. */
  changed(): void {
    this.generation++;
  }
}
