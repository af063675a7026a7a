import type { Role } from '../../shared/permissions';
import type { Database } from '../../server/db/client';
import { memberships, restorations } from '../../server/db/schema';

/** A restoration with the given people already holding their roles. */
export async function createRestoration(
  db: Database,
  members: { userId: number; role: Role }[],
  fields: { make?: string; model?: string } = {},
) {
  const [row] = await db
    .insert(restorations)
    .values({
      make: fields.make ?? 'Farrowby',
      model: fields.model ?? 'Lark 3',
      serial: `F-${Math.floor(Math.random() * 1e6)}`,
    })
    .returning();
  if (members.length) await db.insert(memberships).values(members.map((m) => ({ ...m, restorationId: row!.id })));
  return row!;
}
