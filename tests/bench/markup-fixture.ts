import { sql } from 'drizzle-orm';
import { connectDatabase } from '../../server/db/client';
import { findings } from '../../server/db/schema';

/** The demo's underside photo (before): its markup page's URL, and a way to add 997 findings to it (1,000 in all). */
export async function markupFixture(product: { origin: string; databaseUrl: string }) {
  const db = connectDatabase(product.databaseUrl);
  const [photo] = (
    await db.db.execute<{ id: number; restoration_id: number }>(
      sql`select id, restoration_id from photos where view = 'underside' and phase = 'before' limit 1`,
    )
  ).rows;
  const url = `${product.origin}/restorations/${photo!.restoration_id}/photos/${photo!.id}`;
  return {
    url,
    async addFindings() {
      const shapes = ['pin', 'circle', 'rect', 'arrow', 'freehand'] as const;
      await db.db.insert(findings).values(
        Array.from({ length: 997 }, (_, i) => {
          const shape = shapes[i % 5]!;
          const x = 0.02 + (i % 40) / 41;
          const y = 0.02 + Math.floor(i / 40) / 26;
          const points =
            shape === 'pin'
              ? [{ x, y }]
              : shape === 'freehand'
                ? Array.from({ length: 12 }, (_, k) => ({ x: x + k * 0.001, y: y + Math.sin(k) * 0.005 }))
                : [
                    { x, y },
                    { x: x + 0.01, y: y + 0.015 },
                  ];
          return {
            restorationId: photo!.restoration_id,
            photoId: photo!.id,
            number: 100 + i,
            shape,
            points,
            title: `Bench mark ${i}`,
            kind: 'note' as const,
            severity: 'info' as const,
          };
        }),
      );
    },
    close: () => db.pool.end(),
  };
}
