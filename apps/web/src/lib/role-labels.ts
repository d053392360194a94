import type { Role } from '@photon-ledger/shared';

/** How each role is named to people (DESIGN.md, "Users and roles"). */
export const roleLabels: Readonly<Record<Role, string>> = {
  admin: 'Administrator',
  engineer: 'Engineer',
  lead: 'Systems lead',
  reviewer: 'Reviewer',
};
