/** Catalogue entries for trade studies. */
import type { RouteDoc } from './route-catalogue';

export const studyRouteDocs: RouteDoc[] = [];
