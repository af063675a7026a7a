import type { Role } from './roles';
import { holds, rowEntities, type Condition, type VisibilityFacts } from './visibility-rule';

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

/** What a rule judges: the rows the rule language reads, and the rows judged through what they hang on. */
export const visibilitySubjects = [
  ...rowEntities,
  'referenceMark',
  'readingRequest',
  'symptomCheck',
  'payment',
  'mismatchNote',
] as const;
export type VisibilitySubject = (typeof visibilitySubjects)[number];

const all: Condition = { always: true };
const everything = Object.fromEntries(visibilitySubjects.map((s) => [s, all])) as Record<VisibilitySubject, Condition>;
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
