import { sql, type SQL } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mayView, roles, visibilitySubjects, type Role, type VisibilitySubject } from '../../shared/permissions';
import type { FieldRef, VisibilityFacts } from '../../shared/visibility-rule';
import { eventKindEnum, notificationKindEnum, partActionEnum, partStateEnum } from '../../server/db/schema';
import { fieldsRead, visibleSql, type FieldSources } from '../../server/features/visibility/visibility-sql';
import { createTestDatabase } from '../support/test-database';

// The SQL condition and the in-memory predicate are both generated from shared/permissions.ts `visibility`;
// this file runs the SQL on PostgreSQL and checks it agrees with the predicate, case by case.
let database: Awaited<ReturnType<typeof createTestDatabase>>;
beforeAll(async () => {
  database = await createTestDatabase();
});
afterAll(() => database.drop());

/** A fact as an SQL literal of the column's type, so the condition runs on values instead of rows. */
function literal(ref: FieldRef, value: unknown): SQL {
  const field = ref.split('.')[1]!;
  if (field.endsWith('At')) return sql`${value === null ? null : String(value)}::timestamptz`;
  if (field === 'ownerVisible' || field === 'internal' || field === 'sent') return sql`${value}::boolean`;
  if (field.endsWith('Id')) return sql`${value}::integer`;
  return sql`${value}::text`;
}

function sources(subject: VisibilitySubject, facts: VisibilityFacts): FieldSources {
  const out: FieldSources = {};
  for (const ref of fieldsRead(subject)) {
    const [entity, field] = ref.split('.') as [keyof FieldSources, string];
    (out[entity] ??= {})[field] = literal(ref, facts[entity]?.[field] ?? null);
  }
  return out;
}

/** Evaluates many cases in one statement; returns PostgreSQL's answers in order. */
async function inSql(cases: { role: Role; subject: VisibilitySubject; facts: VisibilityFacts }[]): Promise<boolean[]> {
  const answers: boolean[] = [];
  for (let i = 0; i < cases.length; i += 400) {
    const batch = cases.slice(i, i + 400).map((c) => visibleSql(c.role, c.subject, sources(c.subject, c.facts)));
    const result = await database.db.execute<{ ok: boolean[] }>(
      sql`select array[${sql.join(batch, sql`, `)}]::boolean[] as ok`,
    );
    answers.push(...result.rows[0]!.ok);
  }
  return answers;
}

const t0 = '2026-11-01T09:00:00.000Z';
const t1 = '2026-11-02T09:00:00.000Z';
const shared = { ownerVisible: true };
const internal = { ownerVisible: false };

// Expected answers are the product's rules (PRODUCT.md "Who uses it" and the owner's view): product rules, no outside source.
const table: [string, Role, VisibilitySubject, VisibilityFacts, boolean][] = [
  ['a shared photo', 'owner', 'photo', { photo: shared }, true],
  ['an estimate sent to the owner', 'owner', 'estimate', { estimate: { sent: true } }, true],
  ['a draft estimate', 'owner', 'estimate', { estimate: { sent: false } }, false],
  ['a sent estimate, for a mentor (mentors see no money)', 'mentor', 'estimate', { estimate: { sent: true } }, false],
  [
    'an invoice issued, as a history line for a mentor',
    'mentor',
    'event',
    { event: { kind: 'invoice-issued', createdAt: t0 } },
    false,
  ],
  [
    'a stage change, as a history line for a mentor',
    'mentor',
    'event',
    { event: { kind: 'stage-changed', createdAt: t0 } },
    true,
  ],
  ['a draft estimate, for the technician', 'technician', 'estimate', { estimate: { sent: false } }, true],
  ['a payment on their own set, for the owner', 'owner', 'payment', {}, true],
  ['a payment, for a mentor (mentors see no money)', 'mentor', 'payment', {}, false],
  ['a payment, for the technician', 'technician', 'payment', {}, true],
  [
    "a payment received, in the owner's history",
    'owner',
    'event',
    { event: { kind: 'payment-received', createdAt: t0 } },
    true,
  ],
  ['an unshared photo', 'owner', 'photo', { photo: internal }, false],
  ['a shared finding on an unshared photo', 'owner', 'finding', { finding: shared, photo: internal }, false],
  ['a shared finding on a shared photo', 'owner', 'finding', { finding: shared, photo: shared }, true],
  [
    'a shared comment on an internal finding',
    'owner',
    'comment',
    { comment: { internal: false }, finding: internal, photo: shared },
    false,
  ],
  [
    'an internal comment on a shared finding',
    'owner',
    'comment',
    { comment: { internal: true }, finding: shared, photo: shared },
    false,
  ],
  [
    'a shared comment on a shared finding',
    'owner',
    'comment',
    { comment: { internal: false }, finding: shared, photo: shared },
    true,
  ],
  [
    'an internal comment, for the mentor',
    'mentor',
    'comment',
    { comment: { internal: true }, finding: internal, photo: internal },
    true,
  ],
  ['an unshared reading', 'owner', 'reading', { reading: internal }, false],
  ['a planned part', 'owner', 'part', { part: { state: 'planned', action: 'replaced' } }, false],
  ['a fitted part', 'owner', 'part', { part: { state: 'fitted', action: 'replaced' } }, true],
  ['an original kept', 'owner', 'part', { part: { state: 'planned', action: 'kept-original' } }, true],
  [
    'a planned part, for the technician',
    'technician',
    'part',
    { part: { state: 'planned', action: 'replaced' } },
    true,
  ],
  [
    'a change made before sharing',
    'owner',
    'change',
    { change: { createdAt: t0 }, finding: { ...shared, sharedAt: t1 }, photo: shared },
    false,
  ],
  [
    'a change made after sharing',
    'owner',
    'change',
    { change: { createdAt: t1 }, finding: { ...shared, sharedAt: t0 }, photo: shared },
    true,
  ],
  [
    'a status change before sharing',
    'owner',
    'event',
    { event: { kind: 'finding-status', createdAt: t0 }, finding: { ...shared, sharedAt: t1 }, photo: shared },
    false,
  ],
  [
    'a status change after sharing',
    'owner',
    'event',
    { event: { kind: 'finding-status', createdAt: t1 }, finding: { ...shared, sharedAt: t0 }, photo: shared },
    true,
  ],
  [
    'a question to the mentors on a shared finding',
    'owner',
    'event',
    { event: { kind: 'question-asked', createdAt: t1 }, finding: { ...shared, sharedAt: t0 }, photo: shared },
    false,
  ],
  ['a stage change', 'owner', 'event', { event: { kind: 'stage-changed', createdAt: t0 } }, true],
  [
    'a planned part as an event',
    'owner',
    'event',
    { event: { kind: 'part-fitted', createdAt: t0 }, part: { state: 'planned', action: 'replaced' } },
    false,
  ],
  [
    'a shared reply on a finding later unshared',
    'owner',
    'notification',
    { notification: { commentId: 7 }, comment: { internal: false }, finding: internal, photo: shared },
    false,
  ],
  [
    'a shared reply on a shared finding',
    'owner',
    'notification',
    { notification: { commentId: 7 }, comment: { internal: false }, finding: shared, photo: shared },
    true,
  ],
  [
    'an internal reply',
    'owner',
    'notification',
    { notification: { commentId: 7 }, comment: { internal: true }, finding: shared, photo: shared },
    false,
  ],
  [
    'a question notification, for a mentor',
    'mentor',
    'notification',
    { notification: { commentId: null, kind: 'question' }, finding: internal, photo: internal },
    true,
  ],
  [
    'a payment notification, for the owner (no finding)',
    'owner',
    'notification',
    { notification: { commentId: null, kind: 'payment' } },
    true,
  ],
  [
    'a payment notification, for a mentor (mentors see no money)',
    'mentor',
    'notification',
    { notification: { commentId: null, kind: 'payment' } },
    false,
  ],
  ['an unshared sheet page', 'owner', 'sheetPage', { sheetPage: internal }, false],
  ['a shared sheet page', 'owner', 'sheetPage', { sheetPage: shared }, true],
  ['an unshared sheet page, for a mentor', 'mentor', 'sheetPage', { sheetPage: internal }, true],
  ['a reference mark on an unshared page', 'owner', 'referenceMark', { sheetPage: internal }, false],
  ['a reference mark on a shared page', 'owner', 'referenceMark', { sheetPage: shared }, true],
  ['a reference mark on a shared chassis photo', 'owner', 'referenceMark', { photo: shared }, true],
];

describe('the visibility rule, in memory and in SQL', () => {
  it('when judged on the table of product cases, then the predicate and the SQL both give the expected answer', async () => {
    const sqlAnswers = await inSql(table.map(([, role, subject, facts]) => ({ role, subject, facts })));
    const got = table.map(([name, role, subject, facts], i) => [name, mayView(role, subject, facts), sqlAnswers[i]]);
    expect(got).toEqual(table.map(([name, , , , expected]) => [name, expected, expected]));
  });

  it('when every combination of facts (a fixed sample for events) is judged, then the SQL agrees with the predicate', async () => {
    const bool = [true, false, null];
    const domain = (ref: FieldRef): unknown[] => {
      const field = ref.split('.')[1]!;
      if (ref === 'event.kind') return [...eventKindEnum.enumValues, null];
      if (ref === 'notification.kind') return [...notificationKindEnum.enumValues, null];
      if (ref === 'part.state') return [...partStateEnum.enumValues, null];
      if (ref === 'part.action') return [...partActionEnum.enumValues, null];
      if (field.endsWith('At')) return [t0, t1, null];
      if (field.endsWith('Id')) return [7, null];
      return bool;
    };
    let seed = 20261202;
    const random = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
    const cases: { role: Role; subject: VisibilitySubject; facts: VisibilityFacts }[] = [];
    for (const subject of visibilitySubjects) {
      const refs = fieldsRead(subject);
      let combos: unknown[][] = [[]];
      for (const ref of refs) combos = combos.flatMap((c) => domain(ref).map((v) => [...c, v]));
      const picked =
        combos.length > 3000
          ? Array.from({ length: 3000 }, () => combos[Math.floor(random() * combos.length)]!)
          : combos;
      for (const values of picked)
        for (const role of roles) {
          const facts: VisibilityFacts = {};
          refs.forEach((ref, i) => {
            const [entity, field] = ref.split('.') as [keyof VisibilityFacts, string];
            (facts[entity] ??= {})![field] = values[i];
          });
          cases.push({ role, subject, facts });
        }
    }
    expect(cases.length).toBeGreaterThan(1000);
    const answers = await inSql(cases);
    const disagreements = cases.filter((c, i) => mayView(c.role, c.subject, c.facts) !== answers[i]);
    expect(disagreements).toEqual([]);
    // Both answers occur for the owner, so the agreement is not all-true or all-false.
    expect(new Set(answers)).toEqual(new Set([true, false]));
  });
});
