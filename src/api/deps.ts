/** What the routes are given: the open catalog, who computes, and where to log. */
import type { Catalog } from '../catalog/index.ts';
import type { CatalogSnapshots } from './catalog-snapshot.ts';
import type { Logger } from './http-errors.ts';
import type { Interpreter } from './interpreter.ts';

export interface ApiDeps {
  catalog: Catalog;
  snapshots: CatalogSnapshots;
  interpreter: Interpreter;
  log: Logger;
}
