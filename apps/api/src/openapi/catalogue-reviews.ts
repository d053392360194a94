/** Catalogue entries for reviews, approvals, comments and captured mail. */
import type { RouteDoc } from './route-catalogue';

export const reviewRouteDocs: RouteDoc[] = [];
