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
  'photos.view',
  'photos.upload',
  'photos.edit',
  'photos.delete',
  'photos.original',
  'findings.view',
  'findings.create',
  'findings.edit',
  'findings.delete',
  'findings.share',
  'findings.ask',
  'findings.resolve',
  'comments.create',
  'comments.internal',
  'comments.edit',
  'comments.delete',
  'measurements.view',
  'measurements.record',
  'parts.view',
  'parts.edit',
  'report.download',
  'report.send',
  'bringup.view',
  'bringup.record',
  'bringup.signoff',
] as const;
export type Action = (typeof actions)[number];

/** Facts about the thing acted on that some rules need (e.g. who created a finding). */
export interface PolicyContext {
  isAuthor?: boolean;
  /** The thing is marked as shared with the owner. */
  ownerVisible?: boolean;
}

const rules: Record<Action, (role: Role, context: PolicyContext) => boolean> = {
  'restoration.view': () => true,
  'restoration.edit': (role) => role === 'technician',
  'restoration.delete': (role) => role === 'technician',
  // Everyone on a restoration may see who else works on it; only technicians invite and change roles.
  'members.view': () => true,
  'members.manage': (role) => role === 'technician',
  // Owners see only what is shared with them; everyone else on the restoration sees every photo.
  'photos.view': (role, { ownerVisible }) => role !== 'owner' || ownerVisible === true,
  'photos.upload': (role) => role === 'technician',
  'photos.edit': (role) => role === 'technician',
  'photos.delete': (role) => role === 'technician',
  // Untouched originals may carry GPS and camera data: technicians only.
  'photos.original': (role) => role === 'technician',
  'findings.view': (role, { ownerVisible }) => role !== 'owner' || ownerVisible === true,
  // Mentors may mark a spot ("check this joint"); only technicians change what others placed.
  'findings.create': (role) => role !== 'owner',
  'findings.edit': (role, { isAuthor }) => role === 'technician' || (role === 'mentor' && isAuthor === true),
  'findings.delete': (role, { isAuthor }) => role === 'technician' || (role === 'mentor' && isAuthor === true),
  'findings.share': (role) => role === 'technician',
  'findings.ask': (role) => role === 'technician',
  'findings.resolve': (role) => role !== 'owner',
  // Owners comment only on what is shared with them, and only in the shared thread.
  'comments.create': (role, { ownerVisible }) => role !== 'owner' || ownerVisible === true,
  'comments.internal': (role) => role !== 'owner',
  'comments.edit': (_role, { isAuthor }) => isAuthor === true,
  'comments.delete': (role, { isAuthor }) => isAuthor === true || role === 'technician',
  'measurements.view': (role, { ownerVisible }) => role !== 'owner' || ownerVisible === true,
  'measurements.record': (role) => role === 'technician',
  // Owners see the ledger without costs, sources and notes; technicians keep it.
  'parts.view': () => true,
  'parts.edit': (role) => role === 'technician',
  'report.download': () => true,
  'report.send': (role) => role === 'technician',
  // Everyone on the restoration reads the checklists and the power-up log (owners in their own words);
  // only a technician, who is at the bench, records them or signs the pre-power checklist off.
  'bringup.view': () => true,
  'bringup.record': (role) => role === 'technician',
  'bringup.signoff': (role) => role === 'technician',
};

export function can(role: Role | null | undefined, action: Action, context: PolicyContext = {}): boolean {
  return role ? rules[action](role, context) : false;
}
