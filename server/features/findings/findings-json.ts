import { sql } from 'drizzle-orm';
import type { Database } from '../../db/client';

/**
 * A photo's findings as the JSON the API sends, built by PostgreSQL in one value. The canvas asks for
 * hundreds of findings at a time; letting the database assemble the array avoids parsing and
 * re-serialising thousands of fields in Node (the hot path measured in tests/bench/markup-api.ts).
 * The shape is the `findingSchema` of shared/schemas/findings.ts, checked by tests/api/findings.test.ts.
 */
export async function photoFindingsJson(db: Database, photoId: number, ownerView: boolean): Promise<string> {
  const iso = (column: string) => sql.raw(`to_char(f.${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`);
  const result = await db.execute<{ json: string }>(sql`
    select coalesce(json_agg(row_to_json(x) order by x.number), '[]')::text as json from (
      select f.id, f.photo_id as "photoId", f.restoration_id as "restorationId", f.number, f.shape, f.points, f.title,
        f.component_ref as "componentRef", f.kind, f.severity, f.status, f.dismiss_reason as "dismissReason",
        f.owner_visible as "ownerVisible", f.author_id as "authorId", u.name as "authorName",
        f.question_open as "questionOpen", coalesce(c.n, 0) as "commentCount",
        ${iso('created_at')} as "createdAt", ${iso('updated_at')} as "updatedAt"
      from findings f
      join photos p on p.id = f.photo_id
      left join users u on u.id = f.author_id
      left join (
        select finding_id, count(*)::int as n from comments
        where deleted_at is null and finding_id in (select id from findings where photo_id = ${photoId})
        group by finding_id
      ) c on c.finding_id = f.id
      where f.photo_id = ${photoId} and (${!ownerView} or (f.owner_visible and p.owner_visible))
    ) x`);
  return result.rows[0]!.json;
}
