/**
 * A small declarative language for "who may see which row". A rule is data, so the same rule can be
 * evaluated in memory here and turned into an SQL condition on the server (server/features/visibility/),
 * and a test checks that the two agree (tests/api/visibility-rule.test.ts).
 */

/** Rows that a rule both reads and judges (the subjects in visibility-policy.ts start with these). */
export const rowEntities = [
  'photo',
  'finding',
  'comment',
  'reading',
  'part',
  'event',
  'change',
  'notification',
  'sheetPage',
  'estimate',
] as const;

/** The kinds of thing a rule may look at; each names a row (or a joined row) by what it is. */
export const visibilityEntities = [...rowEntities, 'mismatch'] as const;
export type VisibilityEntity = (typeof visibilityEntities)[number];

/** `entity.field`, e.g. `photo.ownerVisible`; fields are the camelCase names of the row's columns. */
export type FieldRef = `${VisibilityEntity}.${string}`;

export type Condition =
  | { always: true }
  | { never: true }
  | { all: readonly Condition[] }
  | { any: readonly Condition[] }
  /** The condition does not hold (a missing row or field makes its leaf false, so `not` of it true). */
  | { not: Condition }
  /** The field equals the value (a missing row or field counts as null, which equals only null). */
  | { field: FieldRef; is: boolean | string | null }
  | { field: FieldRef; in: readonly string[] }
  /** One instant is strictly later than another (both must be present). */
  | { field: FieldRef; after: FieldRef };

/** What is known about the row being judged and its related rows, keyed by entity. */
export type VisibilityFacts = Partial<Record<VisibilityEntity, Record<string, unknown> | null | undefined>>;

/** The value of `entity.field` in the facts, or null when the row or the field is absent. */
function read(facts: VisibilityFacts, ref: FieldRef): unknown {
  const [entity, field] = ref.split('.') as [VisibilityEntity, string];
  return facts[entity]?.[field] ?? null;
}

const instant = (v: unknown): number | null =>
  v instanceof Date ? v.getTime() : typeof v === 'string' && !Number.isNaN(Date.parse(v)) ? Date.parse(v) : null;

/** Evaluates a condition in memory. */
export function holds(condition: Condition, facts: VisibilityFacts): boolean {
  if ('always' in condition) return true;
  if ('never' in condition) return false;
  if ('all' in condition) return condition.all.every((c) => holds(c, facts));
  if ('any' in condition) return condition.any.some((c) => holds(c, facts));
  if ('not' in condition) return !holds(condition.not, facts);
  const value = read(facts, condition.field);
  if ('is' in condition) return value === condition.is;
  if ('in' in condition) return typeof value === 'string' && condition.in.includes(value);
  const a = instant(value);
  const b = instant(read(facts, condition.after));
  return a !== null && b !== null && a > b;
}

/** Every field a condition reads, so a query can check that it provides them all. */
export function fieldsOf(condition: Condition): FieldRef[] {
  if ('always' in condition || 'never' in condition) return [];
  if ('all' in condition) return condition.all.flatMap(fieldsOf);
  if ('any' in condition) return condition.any.flatMap(fieldsOf);
  if ('not' in condition) return fieldsOf(condition.not);
  return 'after' in condition ? [condition.field, condition.after] : [condition.field];
}
