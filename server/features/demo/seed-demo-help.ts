import { eq } from 'drizzle-orm';
import { findCause, findSymptom } from '../../../shared/bench/symptoms';
import { causeResultLabels, type CauseResult } from '../../../shared/schemas/symptom-checks';
import type { Database } from '../../db/client';
import { helpRequests, readingRequests } from '../../db/schema';
import { recordEvent } from '../events/record-event';
import { helpRepo } from '../help/help.repo';
import { symptomChecksRepo } from '../symptom-checks/symptom-checks.repo';
import { demoSet, demoUserId, WREN_AC_DC } from './demo-lookup';

const SYMPTOM = 'dead-dial-dark';
const checks: { causeId: string; result: CauseResult; note: string }[] = [
  {
    causeId: 'mains-lead-fuse',
    result: 'ruled-out',
    note: 'Unplugged: lead, plug fuse and switch all continuous; the chain reads open with the switch on.',
  },
  {
    causeId: 'heater-chain-open',
    result: 'confirmed',
    note: "The dropper's second section reads open, with a burnt gap in the winding.",
  },
];

/**
 * The Wren AC/DC's call for help, so the Help tab and the benches are not empty in the demo: Mara worked through
 * "set dead" on the checklist (unplugged tests only), asked the workshop's mentor before ordering a new dropper, and
 * Teodor asked for two more resistance readings, still waiting on her bench. Rows and history lines are written
 * in one transaction; nothing is notified or mailed. Runs once: a set that already has a help request is left alone.
 */
export async function seedDemoHelp(db: Database): Promise<void> {
  const techId = await demoUserId(db, 'technician');
  const mentorId = await demoUserId(db, 'mentor');
  const set = await demoSet(db, WREN_AC_DC);
  if (!techId || !mentorId || !set) return;
  const [existing] = await db
    .select({ id: helpRequests.id })
    .from(helpRequests)
    .where(eq(helpRequests.restorationId, set.id))
    .limit(1);
  if (existing) return;

  await db.transaction(async (tx) => {
    const restorationId = set.id;
    for (const check of checks) {
      await symptomChecksRepo(tx).upsert({ restorationId, symptomId: SYMPTOM, ...check, checkedById: techId });
      await recordEvent(tx, {
        restorationId,
        kind: 'cause-checked',
        actorId: techId,
        data: {
          symptom: findSymptom(SYMPTOM)!.title,
          cause: findCause(SYMPTOM, check.causeId)!.cause,
          result: causeResultLabels[check.result].toLowerCase(),
        },
      });
    }
    const help = await helpRepo(tx).insert({
      restorationId,
      authorId: techId,
      symptom:
        "Dead: no dial lamp, no valve warms. The dropper's second section is open. Before I fit a new one: what " +
        'rating should it have, and what might have burnt it out that I should check first?',
      symptomIds: [SYMPTOM],
    });
    await recordEvent(tx, {
      restorationId,
      kind: 'help-requested',
      actorId: techId,
      data: { helpRequestId: help.id },
    });
    const body =
      'Unplugged: the heater chain end to end with the dropper out of circuit, and each remaining dropper section.';
    const [asked] = await tx
      .insert(readingRequests)
      .values({ restorationId, helpRequestId: help.id, kind: 'reading', body, askedById: mentorId })
      .returning({ id: readingRequests.id });
    await recordEvent(tx, {
      restorationId,
      kind: 'reading-requested',
      actorId: mentorId,
      data: { readingRequestId: asked!.id, body },
    });
  });
}
