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
    landmark: 'C27',
    shape: 'circle' as const,
    title: 'Leaky coupling capacitor to the output valve',
    componentRef: 'C27',
    kind: 'leaking' as const,
    severity: 'fault' as const,
    status: 'repaired' as const,
    ownerVisible: true,
    question: false,
    thread: [
      [
        'technician',
        'Brought it up slowly on the variable autotransformer with the back off: after about four minutes the EL84 anode glows dull red. V5 grid (pin 2) sits at +4.6 V to chassis where it should be a fraction of a volt, and the cathode climbs to 12.8 V.',
        'internal',
      ],
      [
        'mentor',
        'Positive grid with a red anode: the coupling cap from the EABC80 is passing DC. Lift one end of C27 and test it at working voltage before you condemn the valve, and measure the grid leak R28 while you are there.',
        'internal',
      ],
      [
        'technician',
        'C27 out of circuit: 3.3 MΩ at 350 V, it should be well over 100 MΩ. R28 reads 1.3 MΩ against 470 kΩ, which let the grid float up further.',
        'internal',
      ],
      [
        'technician',
        'The capacitor that passes the signal to the output valve was leaking and pushed that valve too hard, which is why it glowed red and the sound faded. It and the resistor beside it have been replaced; the valve tests good and stays cool now.',
        'shared',
      ],
    ] as Line[],
  },
  {
    landmark: 'volumeControl',
    shape: 'rect' as const,
    title: 'Volume control crackles',
    componentRef: 'R20',
    kind: 'noisy-control' as const,
    severity: 'wear' as const,
    status: 'repaired' as const,
    ownerVisible: true,
    question: false,
    thread: [
      [
        'technician',
        '@Teodor the volume control crackles over the whole track, worst near the top. Clean it, or look for a replacement 1 MΩ log with a double-pole switch?',
        'internal',
      ],
      [
        'mentor',
        'Check for DC across the track first: a leaky capacitor feeding it makes any pot crackle and cleaning will not cure that.',
        'internal',
      ],
      [
        'technician',
        'No DC across it, so it is the track. Cleaned through the gap by the tags and worked end to end thirty times; quiet now.',
        'internal',
      ],
      ['technician', 'The volume control was cleaned and now turns without crackling.', 'shared'],
    ] as Line[],
  },
  {
    landmark: 'crackedLead',
    shape: 'arrow' as const,
    title: 'Perished rubber wiring',
    componentRef: '',
    kind: 'cracked' as const,
    severity: 'hazard' as const,
    status: 'confirmed' as const,
    ownerVisible: false,
    question: true,
    thread: [
      [
        'mentor',
        'The rubber on the lead from the transformer to the rectifier anode has split to the copper, and it carries several hundred volts AC. Nothing goes back on the mains until it is replaced.',
        'internal',
      ],
      ['technician', 'Replaced in PVC along the same route.', 'internal'],
      [
        'technician',
        '@Teodor the leads from the chassis to the speaker and the deck motor are the same rubber and crumble where they bend. They are outside the chassis: replace them now, or ask the owner first?',
        'internal',
      ],
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
      s.shape === 'circle'
        ? [
            { x: m.x, y: m.y },
            { x: m.x + rx, y: m.y },
          ]
        : s.shape === 'rect'
          ? [
              { x: m.x - rx, y: m.y - ry * 0.6 },
              { x: m.x + rx, y: m.y + ry * 0.6 },
            ]
          : [
              { x: m.x + 0.07, y: m.y - 0.08 },
              { x: m.x + rx * 0.5, y: m.y - ry * 0.3 },
            ];
    const id = await repo.insert({
      restorationId: photo.restorationId,
      photoId: photo.id,
      shape: s.shape,
      points,
      title: s.title,
      componentRef: s.componentRef,
      kind: s.kind,
      severity: s.severity,
      status: s.status,
      ownerVisible: s.ownerVisible,
      authorId: ids.technician,
      questionOpen: s.question,
      questionAskedAt: s.question ? new Date() : null,
      questionAskedById: s.question ? ids.technician : null,
    });
    for (const [who, body, visibility] of s.thread)
      await db.insert(comments).values({
        findingId: id,
        authorId: ids[who],
        body,
        internal: visibility === 'internal',
        mentions: body.includes('@Teodor') && ids.mentor ? [ids.mentor] : [],
        createdAt: new Date(Date.now() - (120 - minute++ * 7) * 60_000),
      });
  }
}
