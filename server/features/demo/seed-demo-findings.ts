import { and, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { comments, findings, photos, restorations, users } from '../../db/schema';
import { demoPeople } from '../../db/seed/demo-scenario';
import { findingsRepo } from '../findings/findings.repo';
import { chassisLandmarks } from './chassis';

type Person = keyof typeof demoPeople;
type Line = [Person, string, 'internal' | 'shared'];

/** The demo's findings on the Meridian 54's underside photo, pinned on the drawn parts, with their threads. */
const scenario = [
  {
    landmark: 'R23', shape: 'circle' as const, title: 'Charred cathode resistor', componentRef: 'R23', kind: 'overheated' as const,
    severity: 'fault' as const, status: 'repaired' as const, ownerVisible: true, question: false,
    thread: [
      ['technician', 'R23 (150 Ω, EL84 cathode) is blackened and reads 212 Ω cold. The bypass C31 beside it is scorched too.', 'internal'],
      ['mentor', 'Classic: C31 went short, the full cathode current ran through R23. Check the EL84 for a heater-cathode short before fitting new parts, and measure C31 out of circuit.', 'internal'],
      ['technician', 'C31 measures 3 Ω across it: shorted. EL84 tests fine on heater-cathode.', 'internal'],
      ['technician', 'The burnt resistor on the output stage will be replaced, with its capacitor, which had failed and caused it.', 'shared'],
    ] as Line[],
  },
  {
    landmark: 'C30', shape: 'rect' as const, title: 'Bulging filter capacitor', componentRef: 'C30', kind: 'leaking' as const,
    severity: 'hazard' as const, status: 'repaired' as const, ownerVisible: true, question: false,
    thread: [
      ['technician', '@Teodor C30 (32 µF 350 V) has a domed end and a trace of electrolyte. Restuff the original can or fit a modern 47 µF 450 V beside it?', 'internal'],
      ['mentor', 'Restuff it: the owner asked for hidden parts to look original. 47 µF 450 V fits inside that can size.', 'internal'],
      ['technician', 'Restuffed with 47 µF 450 V; HT now 262 V and the hum has gone.', 'shared'],
    ] as Line[],
  },
  {
    landmark: 'crackedLead', shape: 'arrow' as const, title: 'Cracked rubber HT lead', componentRef: '', kind: 'cracked' as const,
    severity: 'hazard' as const, status: 'confirmed' as const, ownerVisible: false, question: true,
    thread: [
      ['mentor', 'That perished rubber lead carries HT to the EZ80: replace it before any power-up.', 'internal'],
      ['technician', '@Teodor new PVC lead of the same gauge, or re-sleeve the original to keep the look? The owner asked for hidden parts to look original.', 'internal'],
    ] as Line[],
  },
];

export async function seedDemoFindings(db: Database): Promise<void> {
  const [photo] = await db
    .select({ id: photos.id, restorationId: photos.restorationId })
    .from(photos)
    .innerJoin(restorations, eq(restorations.id, photos.restorationId))
    .where(and(eq(restorations.serial, 'OV-54-20417'), eq(photos.view, 'underside')));
  if (!photo) return;
  const [existing] = await db.select({ id: findings.id }).from(findings).where(eq(findings.photoId, photo.id)).limit(1);
  if (existing) return;
  const ids = Object.fromEntries(
    await Promise.all(
      (Object.keys(demoPeople) as Person[]).map(async (p) => {
        const [u] = await db.select({ id: users.id }).from(users).where(eq(users.email, demoPeople[p].email));
        return [p, u?.id ?? null] as const;
      }),
    ),
  ) as Record<Person, number | null>;
  const marks = chassisLandmarks('underside');
  const repo = findingsRepo(db);
  let minute = 0;
  for (const s of scenario) {
    const m = marks[s.landmark]!;
    const rx = m.r;
    const ry = m.r * 1.5; // the picture is 3:2, so a radius in x-units is 1.5× as tall in y-units
    const points =
      s.shape === 'circle' ? [{ x: m.x, y: m.y }, { x: m.x + rx, y: m.y }]
      : s.shape === 'rect' ? [{ x: m.x - rx, y: m.y - ry * 0.6 }, { x: m.x + rx, y: m.y + ry * 0.6 }]
      : [{ x: m.x + 0.07, y: m.y - 0.08 }, { x: m.x + rx * 0.5, y: m.y - ry * 0.3 }];
    const id = await repo.insert({
      restorationId: photo.restorationId, photoId: photo.id, shape: s.shape, points, title: s.title, componentRef: s.componentRef,
      kind: s.kind, severity: s.severity, status: s.status, ownerVisible: s.ownerVisible, authorId: ids.technician,
      questionOpen: s.question, questionAskedAt: s.question ? new Date() : null,
    });
    for (const [who, body, visibility] of s.thread)
      await db.insert(comments).values({
        findingId: id, authorId: ids[who], body, internal: visibility === 'internal',
        mentions: body.includes('@Teodor') && ids.mentor ? [ids.mentor] : [],
        createdAt: new Date(Date.now() - (120 - minute++ * 7) * 60_000),
      });
  }
}
