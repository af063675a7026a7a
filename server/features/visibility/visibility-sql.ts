import { and, eq, getTableColumns, or, sql, type SQL, type SQLWrapper } from 'drizzle-orm';
import { roles, visibility, type Role, type VisibilitySubject } from '../../../shared/permissions';
import { fieldsOf, type Condition, type FieldRef, type VisibilityEntity } from '../../../shared/visibility-rule';
import { findingChanges, findings } from '../../db/schema';

/** Where a query finds each field a rule reads: entity → field → column or expression. */
export type FieldSources = Partial<Record<VisibilityEntity, Record<string, SQLWrapper>>>;

/** A table's (or an alias's) columns as field sources. */
export const columnsOf = (table: Parameters<typeof getTableColumns>[0]): Record<string, SQLWrapper> => ({
  ...getTableColumns(table),
});

/**
 * When a finding was last shared with the owner: the latest change that set `ownerVisible` to true, or its
 * creation when it was created shared. `finding` is the findings table or an alias of it.
 */
export function findingSharedAt(finding: typeof findings = findings): SQL {
  return sql`coalesce((select max(${findingChanges.createdAt}) from ${findingChanges}
    where ${findingChanges.findingId} = ${finding.id} and ${findingChanges.changes} -> 'ownerVisible' ->> 1 = 'true'), ${finding.createdAt})`;
}

/** The findings table's fields, with `sharedAt` derived from its change records. */
export const findingFields = (finding: typeof findings = findings) => ({
  ...columnsOf(finding),
  sharedAt: findingSharedAt(finding),
});

function source(sources: FieldSources, ref: FieldRef): SQLWrapper {
  const [entity, field] = ref.split('.') as [VisibilityEntity, string];
  const found = sources[entity]?.[field];
  if (!found) throw new Error(`The query gives the visibility rule no source for ${ref}.`);
  return found;
}

/**
 * A condition as SQL. Every leaf is two-valued (a missing joined row reads as null and fails the test, as
 * in memory), so the whole condition is true or false, never null.
 */
export function conditionSql(condition: Condition, sources: FieldSources): SQL {
  if ('always' in condition) return sql`true`;
  if ('never' in condition) return sql`false`;
  if ('all' in condition)
    return condition.all.length
      ? sql`(${sql.join(
          condition.all.map((c) => conditionSql(c, sources)),
          sql` and `,
        )})`
      : sql`true`;
  if ('any' in condition)
    return condition.any.length
      ? sql`(${sql.join(
          condition.any.map((c) => conditionSql(c, sources)),
          sql` or `,
        )})`
      : sql`false`;
  if ('not' in condition) return sql`(not ${conditionSql(condition.not, sources)})`;
  const column = source(sources, condition.field);
  if ('is' in condition) {
    if (condition.is === null) return sql`(${column} is null)`;
    if (condition.is === true) return sql`(${column} is true)`;
    if (condition.is === false) return sql`(${column} is false)`;
    return sql`coalesce(${column}::text = ${condition.is}, false)`;
  }
  if ('in' in condition)
    return sql`coalesce(${column}::text in (${sql.join(
      condition.in.map((v) => sql`${v}`),
      sql`, `,
    )}), false)`;
  return sql`coalesce(${column} > ${source(sources, condition.after)}, false)`;
}

/** The SQL condition for what `role` may see of `subject`; every field the rule reads must have a source. */
export function visibleSql(role: Role, subject: VisibilitySubject, sources: FieldSources): SQL {
  return conditionSql(visibility[role][subject], sources);
}

/**
 * The same, when the role comes from a column (a person's role differs per restoration, e.g. in their
 * notifications across all their sets). A row with no role (not a member) is never visible.
 */
export function visibleSqlByRole(role: SQLWrapper, subject: VisibilitySubject, sources: FieldSources): SQL {
  return or(...roles.map((r) => and(eq(role as never, r), visibleSql(r, subject, sources))))!;
}

/** Every field any role's rule for a subject reads (a query, or a test, must give a source for each). */
export const fieldsRead = (subject: VisibilitySubject) => [
  ...new Set(roles.flatMap((r) => fieldsOf(visibility[r][subject]))),
];
