/** The roles a person holds, one per restoration (PRODUCT.md, "Who uses it"). */
export const roles = ['technician', 'mentor', 'owner'] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = { technician: 'Technician', mentor: 'Mentor', owner: 'Owner' };

/**
 * A person's role in the workshop as a whole, from the roles they hold on restorations: a technician anywhere is
 * the workshop's technician; otherwise a mentor anywhere is a mentor; otherwise an owner. Null with no restoration.
 */
export function workshopRole(held: readonly Role[]): Role | null {
  return roles.find((r) => held.includes(r)) ?? null;
}
