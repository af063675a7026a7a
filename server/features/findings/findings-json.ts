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
    select coalesce(jsonb_agg(jsonb_build_object(
      'id', f.id, 'photoId', f.photo_id, 'restorationId', f.restoration_id, 'number', f.number, 'shape', f.shape,
      'points', f.points, 'title', f.title, 'componentRef', f.component_ref, 'kind', f.kind, 'severity', f.severity,
      'status', f.status, 'dismissReason', f.dismiss_reason, 'ownerVisible', f.owner_visible, 'authorId', f.author_id,
      'authorName', u.name, 'questionOpen', f.question_open,
      'commentCount', (select count(*)::int from comments c where c.finding_id = f.id and c.deleted_at is null),
      'createdAt', ${iso('created_at')}, 'updatedAt', ${iso('updated_at')}
    ) order by f.number), '[]'::jsonb)::text as json
    from findings f
    join photos p on p.id = f.photo_id
    left join users u on u.id = f.author_id
    where f.photo_id = ${photoId} and (${!ownerView} or (f.owner_visible and p.owner_visible))`);
  return result.rows[0]!.json;
}
