/**
 * The one policy (PRODUCT.md, "Who uses it"). Server routes ask it through one guard; the client asks it
 * only to hide what a person cannot do. Roles are held per restoration.
 */
import { holds, type Condition, type VisibilityFacts } from './visibility-rule';

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
  'parts.costs',
  'report.download',
  'report.send',
  'workshop.view',
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

/**
 * A person's role in the workshop as a whole, from the roles they hold on restorations: a technician anywhere is
 * the workshop's technician; otherwise a mentor anywhere is a mentor; otherwise an owner. Null with no restoration.
 */
export function workshopRole(held: readonly Role[]): Role | null {
  return roles.find((r) => held.includes(r)) ?? null;
}

export function can(role: Role | null | undefined, action: Action, context: PolicyContext = {}): boolean {
  return role ? rules[action](role, context) : false;
}

/**
 * What each role may see, as data (the language is in visibility-rule.ts). The server turns each rule into
 * the SQL condition of every query that lists or counts (server/features/visibility/), and checks single
 * rows with `mayView`, so lists, counts, notifications, mail, history, the report and the CSV all follow
 * one rule. Technicians and mentors see everything on their restorations; owners see what is shared.
 *
 * Fields are the rows' columns, plus `finding.sharedAt`: when the finding was last shared with the owner
 * (its creation when it was created shared), so an owner never reads what changed while it was internal.
 */
const sharedPhoto: Condition = { field: 'photo.ownerVisible', is: true };
/** A finding and the photo it is on are both shared. */
const sharedFinding: Condition = { all: [{ field: 'finding.ownerVisible', is: true }, sharedPhoto] };
const sharedComment: Condition = { all: [{ field: 'comment.internal', is: false }, sharedFinding] };
const sharedSheetPage: Condition = { field: 'sheetPage.ownerVisible', is: true };
/** A reference mark follows what it is placed on: a sheet page or a chassis photo. */
const sharedReferenceMark: Condition = { any: [sharedSheetPage, sharedPhoto] };
/** A mismatch note (the chassis differs from the diagram) is workshop material unless shared. */
const sharedMismatch: Condition = { field: 'mismatch.ownerVisible', is: true };
const sharedReading: Condition = { field: 'reading.ownerVisible', is: true };
/** Planned and ordered lines are the workshop's business; the owner sees what was fitted or kept. */
const ownerPart: Condition = {
  any: [
    { field: 'part.state', is: 'fitted' },
    { field: 'part.action', is: 'kept-original' },
  ],
};
const sinceShared = (entity: 'event' | 'change'): Condition => ({
  field: `${entity}.createdAt`,
  after: 'finding.sharedAt',
});
const eventOf = (kind: string, ...conditions: Condition[]): Condition => ({
  all: [{ field: 'event.kind', is: kind }, ...conditions],
});

export const visibilitySubjects = [
  'photo',
  'finding',
  'comment',
  'reading',
  'part',
  'event',
  'change',
  'notification',
  'sheetPage',
  'referenceMark',
  'estimate',
  'readingRequest',
  'symptomCheck',
  'payment',
  'mismatchNote',
] as const;
export type VisibilitySubject = (typeof visibilitySubjects)[number];

const all: Condition = { always: true };
const everything: Record<VisibilitySubject, Condition> = {
  photo: all,
  finding: all,
  comment: all,
  reading: all,
  part: all,
  event: all,
  change: all,
  notification: all,
  sheetPage: all,
  referenceMark: all,
  estimate: all,
  readingRequest: all,
  symptomCheck: all,
  payment: all,
  mismatchNote: all,
};
/** Mentors help with the work and see none of its money. */
const noMoney: Condition = { never: true };
/** History lines about money (estimates sent and answered, invoices issued and voided); they carry no amounts, but still. */
const moneyEvent: Condition = {
  field: 'event.kind',
  in: ['estimate-sent', 'estimate-decided', 'invoice-issued', 'invoice-voided', 'payment-received', 'payment-refunded'],
};

export const visibility: Record<Role, Record<VisibilitySubject, Condition>> = {
  technician: everything,
  mentor: {
    ...everything,
    estimate: noMoney,
    payment: noMoney,
    event: { not: moneyEvent },
    notification: { not: { field: 'notification.kind', is: 'payment' } },
  },
  owner: {
    photo: sharedPhoto,
    finding: sharedFinding,
    /** A shared comment on a finding the owner may see. */
    comment: sharedComment,
    reading: sharedReading,
    part: ownerPart,
    /** A line of the history: each kind follows its subject; questions to the mentors never reach the owner. */
    event: {
      any: [
        eventOf('photo-added', sharedPhoto),
        eventOf('finding-opened', sharedFinding),
        eventOf('finding-status', sharedFinding, sinceShared('event')),
        eventOf('measurement-out', sharedReading),
        eventOf('part-fitted', ownerPart),
        eventOf('stage-changed'),
        // The safety record is the owner's business too: the test as judged, an override in red, soak runs, sends.
        eventOf('safety-test'),
        eventOf('safety-override'),
        eventOf('soak-session'),
        eventOf('report-sent'),
        // The checks before first power and the power-up steps, in the owner's words (a waiver or a stop in red).
        eventOf('intake-checked'),
        eventOf('pre-power-set'),
        eventOf('pre-power-signed'),
        eventOf('pre-power-voided'),
        eventOf('bringup-step'),
        // An estimate sent to the owner and their answer (the history lines carry the version, never amounts).
        eventOf('estimate-sent'),
        eventOf('estimate-decided'),
        eventOf('invoice-issued'),
        eventOf('invoice-voided'),
        eventOf('payment-received'),
        eventOf('payment-refunded'),
        // The service sheet: a page added, a reference marked, a mismatch noted, each as its subject is shared.
        eventOf('sheet-added', sharedSheetPage),
        eventOf('reference-marked', sharedReferenceMark),
        eventOf('mismatch-noted', sharedMismatch),
      ],
    },
    /** A finding's change record, only from after it was shared. */
    change: { all: [sharedFinding, sinceShared('change')] },
    sheetPage: sharedSheetPage,
    referenceMark: sharedReferenceMark,
    mismatchNote: sharedMismatch,
    /** An in-app notification or its e-mail, judged when read or sent, not when written. */
    /** An estimate once sent to them; drafts stay in the workshop. */
    estimate: { field: 'estimate.sent', is: true },
    /** A mentor's request for a reading is the workshop's business. */
    readingRequest: { never: true },
    /**
     * A cause of the symptom checklist and how it came out, as a help link's reader reads it (owners have no route
     * to the checklist itself): its note is never sent, its reading and finding follow their own rules.
     */
    symptomCheck: all,
    /** Payments and refunds on their own sets' invoices (membership is checked by the guard), card or by hand. */
    payment: all,
    notification: {
      any: [
        {
          all: [
            sharedFinding,
            {
              any: [
                { field: 'notification.commentId', is: null },
                { field: 'comment.internal', is: false },
              ],
            },
          ],
        },
        // Money received or refunded on their own set.
        { field: 'notification.kind', is: 'payment' },
      ],
    },
  },
};

/** Fields of a finding's change record a role never reads (questions to the mentors and sharing are internal). */
export const hiddenChangeFields: Record<Role, readonly string[]> = {
  technician: [],
  mentor: [],
  owner: ['questionOpen', 'ownerVisible'],
};

/** The in-memory twin of the SQL condition: may this role see the row these facts describe? */
export function mayView(role: Role | null | undefined, subject: VisibilitySubject, facts: VisibilityFacts): boolean {
  return role ? holds(visibility[role][subject], facts) : false;
}
