/**
 * The one policy (PRODUCT.md, "Who uses it"). Server routes ask it through one guard; the client asks it
 * only to hide what a person cannot do. Roles are held per restoration.
 */
export const roles = ['technician', 'mentor', 'owner'] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = { technician: 'Technician', mentor: 'Mentor', owner: 'Owner' };

export const actions = [
  'restoration.view',
  'restoration.edit',
  'restoration.delete',
  'members.view',
  'members.manage',
] as const;
export type Action = (typeof actions)[number];

/** Facts about the thing acted on that some rules need (e.g. who created a finding). */
export interface PolicyContext {
  isAuthor?: boolean;
}

const rules: Record<Action, (role: Role, context: PolicyContext) => boolean> = {
  'restoration.view': () => true,
  'restoration.edit': (role) => role === 'technician',
  'restoration.delete': (role) => role === 'technician',
  // Everyone on a restoration may see who else works on it; only technicians invite and change roles.
  'members.view': () => true,
  'members.manage': (role) => role === 'technician',
};

export function can(role: Role | null | undefined, action: Action, context: PolicyContext = {}): boolean {
  return role ? rules[action](role, context) : false;
}
