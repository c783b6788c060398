import type { Db } from '../../db/client';
import { createCriteriaAccess } from './access';
import { createCriteriaQueries } from './queries';
import { createCriteriaCsv } from './rows-csv';
import { createCriteriaVersions } from './versions';

/**
 * Code tables (criteria sets) of a firm, with versions: a version used by a stored check run is frozen,
 * and editing it creates the next version; unfrozen versions are edited in place (revision + 1).
 *
 * By workflow: `queries` (reading), `versions` (create, edit in place or as the next version, freeze,
 * delete), `rows-csv` (rows and their CSV), `access` (who may do what).
 */
export function createCriteriaService(db: Db) {
  const q = createCriteriaQueries(db);
  const { edit, ...versions } = createCriteriaVersions(db, q);
  return {
    ...q,
    ...versions,
    ...createCriteriaAccess(db),
    ...createCriteriaCsv(db, q, edit),
  };
}
