import { z } from 'zod';

// Request and response schemas of the API (see the route files in apps/api/src/routes).
export const _api_reviewsPlaceholder = z.never().optional();
