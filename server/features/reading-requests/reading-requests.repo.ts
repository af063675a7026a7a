import { aliasedTable, and, desc, eq, gt, inArray, isNull, or, sql, type SQL } from 'drizzle-orm';
import { rolesAllowed, type Role } from '../../../shared/permissions';
import type { BenchReadingRequest, ReadingRequest } from '../../../shared/schemas/reading-requests';
import type { AppDeps } from '../../app-deps';
import type { Executor } from '../../db/client';
import { measurements, memberships, photos, readingRequests, restorations, users } from '../../db/schema';
import { readingSummary } from '../measurements/reading-summary';
import { photoKeys } from '../photos/photo-objects';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

const asker = aliasedTable(users, 'asker');
const answerer = aliasedTable(users, 'answerer');
/** The roles that read requests for readings (the routes' `help.view`). */
const readers = rolesAllowed('help.view');

/** Requests for readings with their answer, as `role` may see them (owners: none, by the one rule). */
async function select(
  deps: Pick<AppDeps, 'storage'> & { db: Executor },
  role: Role,
  where: SQL | undefined,
  limit = 200,
) {
  const rows = await deps.db
    .select({
      r: readingRequests,
      askedBy: asker.name,
      answeredBy: answerer.name,
      m: measurements,
      p: photos,
      make: restorations.make,
      model: restorations.model,
    })
    .from(readingRequests)
    .innerJoin(restorations, eq(restorations.id, readingRequests.restorationId))
    .leftJoin(asker, eq(asker.id, readingRequests.askedById))
    .leftJoin(answerer, eq(answerer.id, readingRequests.answeredById))
    .leftJoin(measurements, eq(measurements.id, readingRequests.measurementId))
    .leftJoin(photos, eq(photos.id, readingRequests.photoId))
    .where(
      and(
        where,
        visibleSql(role, 'readingRequest', {}),
        visibleSql(role, 'reading', { reading: columnsOf(measurements) }),
        visibleSql(role, 'photo', { photo: columnsOf(photos) }),
      ),
    )
    .orderBy(sql`${readingRequests.answeredAt} is not null`, desc(readingRequests.createdAt), desc(readingRequests.id))
    .limit(limit);
  return Promise.all(
    rows.map(async ({ r, askedBy, answeredBy, m, p, make, model }) => ({
      request: {
        id: r.id,
        restorationId: r.restorationId,
        helpRequestId: r.helpRequestId,
        kind: r.kind,
        body: r.body,
        askedBy,
        createdAt: r.createdAt.toISOString(),
        answeredAt: r.answeredAt?.toISOString() ?? null,
        answeredBy,
        answerNote: r.answerNote,
        reading: m ? readingSummary(m) : null,
        photo: p
          ? { id: p.id, caption: p.caption, thumbUrl: await deps.storage.getSignedUrl(photoKeys(p.storageKey).thumb) }
          : null,
      } satisfies ReadingRequest,
      set: `${make} ${model}`,
      askedById: r.askedById,
    })),
  );
}

export function readingRequestsRepo(deps: Pick<AppDeps, 'storage'> & { db: Executor }) {
  const { db } = deps;
  return {
    async insert(values: typeof readingRequests.$inferInsert) {
      const [row] = await db.insert(readingRequests).values(values).returning();
      return row!;
    },
    /** Read for update, so two answers to one request are decided one after the other. */
    async lock(id: number) {
      const [row] = await db
        .select({ r: readingRequests, make: restorations.make, model: restorations.model })
        .from(readingRequests)
        .innerJoin(restorations, eq(restorations.id, readingRequests.restorationId))
        .where(eq(readingRequests.id, id))
        .for('update', { of: readingRequests });
      return row && { ...row.r, set: `${row.make} ${row.model}` };
    },
    async answer(id: number, values: Partial<typeof readingRequests.$inferInsert>) {
      await db.update(readingRequests).set(values).where(eq(readingRequests.id, id));
    },
    async restorationOf(id: number) {
      const [row] = await db
        .select({ id: readingRequests.restorationId })
        .from(readingRequests)
        .where(eq(readingRequests.id, id));
      return row?.id;
    },
    async one(id: number, role: Role) {
      return (await select(deps, role, eq(readingRequests.id, id)))[0]?.request;
    },
    async list(restorationId: number, role: Role) {
      return (await select(deps, role, eq(readingRequests.restorationId, restorationId))).map((r) => r.request);
    },
    /**
     * For a bench: on every set where the person's role reads them (technician or mentor), the open requests and those answered in
     * the last fortnight. Each set is judged by the person's own role there.
     */
    async bench(userId: number): Promise<BenchReadingRequest[]> {
      const mine = await db
        .select({ restorationId: memberships.restorationId, role: memberships.role })
        .from(memberships)
        .where(and(eq(memberships.userId, userId), inArray(memberships.role, readers)));
      const out: BenchReadingRequest[] = [];
      for (const role of readers) {
        const ids = mine.filter((m) => m.role === role).map((m) => m.restorationId);
        if (!ids.length) continue;
        const recent = or(
          isNull(readingRequests.answeredAt),
          gt(readingRequests.answeredAt, sql`now() - interval '14 days'`),
        );
        for (const r of await select(deps, role, and(inArray(readingRequests.restorationId, ids), recent), 50))
          out.push({ ...r.request, set: r.set, mine: r.askedById === userId });
      }
      return out.sort(
        (a, b) =>
          Number(a.answeredAt !== null) - Number(b.answeredAt !== null) || b.createdAt.localeCompare(a.createdAt),
      );
    },
  };
}
