import { and, asc, eq, inArray, isNull, ne, or } from 'drizzle-orm';
import { rolesAllowed } from '../../../shared/permissions';
import type { OpenQuestion } from '../../../shared/schemas/findings';
import type { Executor } from '../../db/client';
import { findings, memberships, restorations } from '../../db/schema';

/**
 * `GET /api/questions`: open questions on the sets where the person is a technician or mentor, oldest first. A
 * question waits for the others on the set, not for the person who asked it.
 */
export async function openQuestionsFor(db: Executor, userId: number): Promise<OpenQuestion[]> {
  const rows = await db
    .select({ f: findings, make: restorations.make, model: restorations.model })
    .from(findings)
    .innerJoin(restorations, eq(restorations.id, findings.restorationId))
    .innerJoin(memberships, and(eq(memberships.restorationId, findings.restorationId), eq(memberships.userId, userId)))
    .where(
      and(
        eq(findings.questionOpen, true),
        inArray(memberships.role, rolesAllowed('workshop.view')),
        or(isNull(findings.questionAskedById), ne(findings.questionAskedById, userId)),
      ),
    )
    .orderBy(asc(findings.questionAskedAt));
  return rows.map(({ f, make, model }) => ({
    findingId: f.id,
    photoId: f.photoId,
    restorationId: f.restorationId,
    set: `${make} ${model}`,
    number: f.number,
    title: f.title,
    componentRef: f.componentRef,
    askedAt: (f.questionAskedAt ?? f.updatedAt).toISOString(),
  }));
}
