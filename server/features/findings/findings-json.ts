import { sql } from 'drizzle-orm';
import { can, type Role } from '../../../shared/permissions';
import type { Database } from '../../db/client';
import { visibleSql } from '../visibility/visibility-sql';

const column = (alias: string, name: string) => sql.raw(`${alias}.${name}`);

/**
 * A photo's findings as the JSON the API sends, built by PostgreSQL in one value. The canvas asks for
 * hundreds of findings at a time; letting the database assemble the array avoids parsing and
 * re-serialising thousands of fields in Node (the hot path measured in tests/bench/markup-api.ts).
 * The shape is the `findingSchema` of shared/schemas/findings.ts, checked by tests/api/findings.test.ts.
 */
export async function photoFindingsJson(db: Database, photoId: number, role: Role): Promise<string> {
  // The rule's conditions over this query's aliases: the findings (f) on the photo (p), and each comment (c)
  // counted with its own finding (cf) and photo (cp).
  const findingVisible = visibleSql(role, 'finding', {
    finding: { ownerVisible: column('f', 'owner_visible') },
    photo: { ownerVisible: column('p', 'owner_visible') },
  });
  const commentVisible = visibleSql(role, 'comment', {
    comment: { internal: column('c', 'internal') },
    finding: { ownerVisible: column('cf', 'owner_visible') },
    photo: { ownerVisible: column('cp', 'owner_visible') },
  });
  const iso = (column: string) => sql.raw(`to_char(f.${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`);
  const result = await db.execute<{ json: string }>(sql`
    select coalesce(json_agg(row_to_json(x) order by x.number), '[]')::text as json from (
      select f.id, f.photo_id as "photoId", f.restoration_id as "restorationId", f.number, f.shape, f.points, f.title,
        f.component_ref as "componentRef", f.kind, f.severity, f.status, f.dismiss_reason as "dismissReason",
        f.owner_visible as "ownerVisible", f.author_id as "authorId", u.name as "authorName",
        (${can(role, 'workshop.view')} and f.question_open) as "questionOpen", coalesce(c.n, 0) as "commentCount",
        ${iso('created_at')} as "createdAt", ${iso('updated_at')} as "updatedAt"
      from findings f
      join photos p on p.id = f.photo_id
      left join users u on u.id = f.author_id
      left join (
        select c.finding_id, count(*)::int as n from comments c
        join findings cf on cf.id = c.finding_id
        join photos cp on cp.id = cf.photo_id
        where c.deleted_at is null and cf.photo_id = ${photoId} and ${commentVisible}
        group by c.finding_id
      ) c on c.finding_id = f.id
      where f.photo_id = ${photoId} and ${findingVisible}
    ) x`);
  return result.rows[0]!.json;
}
