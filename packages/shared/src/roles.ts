import { z } from 'zod';

/** The four roles of Photon Ledger; see DESIGN.md "Users and roles". */
export const roleKeys = ['admin', 'engineer', 'lead', 'reviewer'] as const;
export const roleSchema = z.enum(roleKeys);
export type Role = z.infer<typeof roleSchema>;
