/**
 * The one policy (PRODUCT.md, "Who uses it"). Server routes ask it through one guard; the client asks it
 * only to hide what a person cannot do. Roles are held per restoration.
 */
import { roles, type Role } from './roles';
import { mayView } from './visibility-policy';

// Roles and what each may see live beside this file; they are exported here too, as they always were.
export { roleLabels, roles, workshopRole, type Role } from './roles';
export {
  hiddenChangeFields,
  mayView,
  visibility,
  visibilitySubjects,
  type VisibilitySubject,
} from './visibility-policy';

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
  'parts.costs',
  'report.download',
  'report.send',
  'workshop.view',
  'workshop.notes',
  'safety.view',
  'safety.record',
  'safety.override',
  'bringup.view',
  'bringup.record',
  'bringup.signoff',
  'sheets.view',
  'sheets.upload',
  'sheets.edit',
  'references.mark',
  'help.view',
  'help.ask',
  'money.view',
  'money.edit',
  'estimates.decide',
  'labour.record',
  'settings.view',
  'settings.edit',
  'payments.checkout',
  'payments.record',
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
  'photos.view': (role, { ownerVisible }) => mayView(role, 'photo', { photo: { ownerVisible: ownerVisible ?? false } }),
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
  'measurements.view': (role, { ownerVisible }) =>
    mayView(role, 'reading', { reading: { ownerVisible: ownerVisible ?? false } }),
  'measurements.record': (role) => role === 'technician',
  // Owners see the ledger without costs, sources and notes; technicians keep it.
  'parts.view': () => true,
  'parts.edit': (role) => role === 'technician',
  // A part's cost is money: not for mentors (money.view), nor for owners, who read the ledger without costs.
  'parts.costs': (role) => can(role, 'money.view') && role !== 'owner',
  'report.download': () => true,
  'report.send': (role) => role === 'technician',
  // The workshop's own working views: planned parts, the shopping list, CSV export, bench warnings, the
  // technician's cautions, the markup tools and questions to the mentors. Owners get their own pages instead.
  'workshop.view': (role) => role !== 'owner',
  // The workshop's working notes on what owners otherwise read: bench notes, a part's source and notes, the bench's
  // warnings on a replacement, who ticked a checklist cause, a power-up step's finding, the chassis serial in a help
  // request. Owners (and a help link's reader, judged as one) read the rest without them.
  'workshop.notes': (role) => role !== 'owner',
  // The final safety test, its override and the soak log: owners read them, mentors comment on findings but never
  // sign off; only a technician records a test, starts or stops a soak, or returns a set on an override.
  'safety.view': () => true,
  'safety.record': (role) => role === 'technician',
  'safety.override': (role) => role === 'technician',
  // Everyone on the restoration reads the checklists and the power-up log (owners in their own words);
  // only a technician, who is at the bench, records them or signs the pre-power checklist off.
  'bringup.view': () => true,
  'bringup.record': (role) => role === 'technician',
  'bringup.signoff': (role) => role === 'technician',
  // Service sheet pages are workshop material: owners see a page only when it is shared with them.
  'sheets.view': (role, { ownerVisible }) =>
    mayView(role, 'sheetPage', { sheetPage: { ownerVisible: ownerVisible ?? false } }),
  'sheets.upload': (role) => role === 'technician',
  'sheets.edit': (role) => role === 'technician',
  // Placing a reference (R23) on a diagram page or a chassis photo: the technician at the bench.
  'references.mark': (role) => role === 'technician',
  // Help requests are the workshop's questions: mentors read them on their bench; only a technician builds one,
  // shares it through a link, revokes the link and approves the replies left through it.
  'help.view': (role) => role !== 'owner',
  'help.ask': (role) => role === 'technician',
  // Money: mentors see none; owners read their own sets' estimates, invoices and payments and answer an estimate;
  // only technicians price, send, invoice and refund. What an owner reads of each is the `visibility` rule below.
  'money.view': (role) => role !== 'mentor',
  'money.edit': (role) => role === 'technician',
  'estimates.decide': (role) => role === 'owner',
  // The labour log is the workshop's own record of time; the owner sees it only as invoice lines.
  'labour.record': (role) => role === 'technician',
  // The workshop's settings (currency, labour rate, markup, tax, invoice prefix) are judged on the person's workshop
  // role: a technician on any restoration is one of the workshop's technicians (see `workshopRole`).
  'settings.view': (role) => role === 'technician',
  'settings.edit': (role) => role === 'technician',
  // Paying by card through the hosted checkout: the owner, or a technician taking the payment at the counter.
  'payments.checkout': (role) => role !== 'mentor',
  // Transfers and cash recorded by hand, and refunds: the workshop's books, technicians only.
  'payments.record': (role) => role === 'technician',
};

export function can(role: Role | null | undefined, action: Action, context: PolicyContext = {}): boolean {
  return role ? rules[action](role, context) : false;
}

/** The roles allowed an action without context, for queries that pick a person's sets by the role held there. */
export function rolesAllowed(action: Action): Role[] {
  return roles.filter((role) => can(role, action));
}
