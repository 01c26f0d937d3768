import type { Role } from '@shared/schemas/auth';

/** Plain-English names of the roles, as people at a fabricator would say them. */
export const roleLabels: Record<Role, string> = {
  customer: 'Customer',
  sales: 'Sales engineer',
  shop: 'Shop',
  admin: 'Administrator',
};

export function roleLabel(role: Role): string {
  return roleLabels[role];
}
