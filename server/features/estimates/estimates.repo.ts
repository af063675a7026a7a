import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import type { Estimate } from '../../../shared/schemas/estimates';
import { lineNet, type PricedLine } from '../../../shared/money/totals';
import type { Executor } from '../../db/client';
import { estimateLines, estimates, users } from '../../db/schema';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

type EstimateRow = typeof estimates.$inferSelect;
type LineRow = typeof estimateLines.$inferSelect;

/** A stored line as the priced low and high lines of the money module, at the estimate's own prices. */
export function pricedBounds(
  line: Pick<LineRow, 'kind' | 'minutesLow' | 'minutesHigh' | 'amountLow' | 'amountHigh'>,
  e: Pick<EstimateRow, 'labourRate' | 'partsMarkupBasisPoints'>,
): { low: PricedLine; high: PricedLine } {
  if (line.kind === 'labour')
    return {
      low: { kind: 'labour', minutes: line.minutesLow ?? 0, hourlyRate: e.labourRate },
      high: { kind: 'labour', minutes: line.minutesHigh ?? 0, hourlyRate: e.labourRate },
    };
  if (line.kind === 'part')
    return {
      low: { kind: 'part', cost: line.amountLow ?? 0, markupBasisPoints: e.partsMarkupBasisPoints },
      high: { kind: 'part', cost: line.amountHigh ?? 0, markupBasisPoints: e.partsMarkupBasisPoints },
    };
  return {
    low: { kind: 'fixed', quantity: 1, unitAmount: line.amountLow ?? 0 },
    high: { kind: 'fixed', quantity: 1, unitAmount: line.amountHigh ?? 0 },
  };
}

function present(e: EstimateRow, createdBy: string | null, lines: LineRow[]): Estimate {
  const m = (amount: number) => ({ amount, currency: e.currency });
  return {
    id: e.id,
    version: e.version,
    note: e.note,
    sent: e.sent,
    sentAt: e.sentAt?.toISOString() ?? null,
    createdBy,
    low: m(e.lowAmount),
    high: m(e.highAmount),
    labourRate: m(e.labourRate),
    partsMarkupBasisPoints: e.partsMarkupBasisPoints,
    tax:
      e.taxRateBasisPoints === null
        ? null
        : { name: e.taxName, rateBasisPoints: e.taxRateBasisPoints, rounding: e.taxRounding },
    decision: e.decision,
    decidedByName: e.decidedByName,
    decidedAt: e.decidedAt?.toISOString() ?? null,
    lines: lines.map((l) => {
      const bounds = pricedBounds(l, e);
      return {
        id: l.id,
        kind: l.kind,
        description: l.description,
        extra: l.extra,
        minutesLow: l.minutesLow,
        minutesHigh: l.minutesHigh,
        low: m(lineNet(bounds.low)),
        high: m(lineNet(bounds.high)),
      };
    }),
  };
}

/** A restoration's estimates the role may see, newest version first, with their lines. */
export async function listEstimates(
  db: Executor,
  restorationId: number,
  role: Role,
  only?: number,
): Promise<Estimate[]> {
  const rows = await db
    .select({ e: estimates, by: users.name })
    .from(estimates)
    .leftJoin(users, eq(users.id, estimates.createdById))
    .where(
      and(
        eq(estimates.restorationId, restorationId),
        only ? eq(estimates.id, only) : undefined,
        visibleSql(role, 'estimate', { estimate: columnsOf(estimates) }),
      ),
    )
    .orderBy(desc(estimates.version));
  if (!rows.length) return [];
  const lines = await db
    .select()
    .from(estimateLines)
    .where(
      inArray(
        estimateLines.estimateId,
        rows.map((r) => r.e.id),
      ),
    )
    .orderBy(asc(estimateLines.position));
  return rows.map(({ e, by }) =>
    present(
      e,
      by,
      lines.filter((l) => l.estimateId === e.id),
    ),
  );
}
