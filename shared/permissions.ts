/** Roles are held per restoration (PRODUCT.md, "Who uses it"). */
export const roles = ['technician', 'mentor', 'owner'] as const;
export type Role = (typeof roles)[number];
