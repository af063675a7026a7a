import { and, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { findings, parts, restorations } from '../../db/schema';
import { measurementsService } from '../measurements/measurements.service';
import { partsService } from '../parts/parts.service';
import { seedDemoSideSets } from './seed-demo-side-sets';
import { demoSet, demoUserId, MERIDIAN_54 } from './demo-lookup';

/** The Meridian 54 radiogram's bench record: valve line-up, readings, parts ledger and care notes; then the other sets'. Runs once. */
export async function seedDemoWorkshop(db: Database): Promise<void> {
  const techId = await demoUserId(db, 'technician');
  if (!techId) return;
  await seedDemoSideSets(db, techId);
  const set = await demoSet(db, MERIDIAN_54);
  if (!set) return;
  const [existing] = await db.select({ id: parts.id }).from(parts).where(eq(parts.restorationId, set.id)).limit(1);
  if (existing) return;
  const ref = async (componentRef: string) =>
    (
      await db
        .select({ id: findings.id })
        .from(findings)
        .where(and(eq(findings.restorationId, set.id), eq(findings.componentRef, componentRef)))
    )[0]?.id ?? null;
  await db
    .update(restorations)
    .set({
      careNotes:
        'Give it a minute to warm up before turning the volume up. Keep the vents in the cabinet floor clear; the chassis runs warm under the deck. Close the lid while a record plays to keep dust off the turntable, and have the stylus looked at after about a year of regular playing. The speaker and motor leads outside the chassis are still the original rubber: do not flex them.',
    })
    .where(eq(restorations.id, set.id));

  const m = measurementsService(db);
  const lineUp: [string, string][] = [
    ['ECC81', ''],
    ['ECF80', ''],
    ['EBF89', ''],
    ['EABC80', ''],
    ['EL84', 'Red-plated on intake; tests good afterwards, kept'],
    ['EM84', 'Dim but usable'],
    ['EZ81', ''],
  ];
  await m.setLineUp(
    set.id,
    lineUp.map(([type, notes], i) => ({ position: `V${i + 1}`, type, notes })),
  );
  const reading = (r: Parameters<typeof m.create>[1]) => m.create(set.id, r, techId);
  const voltage = {
    quantity: 'dc-voltage' as const,
    tolerance: '15',
    method: 'DMM, 10 MΩ input',
    conditions: '236 V mains on the 245 V tap, MW, no signal, volume minimum',
  };
  const c27 = await ref('C27');
  await reading({
    location: 'C27 (out of circuit)',
    quantity: 'insulation',
    expected: '100M',
    reading: '3.3M',
    method: 'Insulation tester, 350 V DC, one end lifted',
    findingId: c27,
  });
  await reading({
    location: 'R28',
    quantity: 'resistance',
    expected: '470k',
    tolerance: '20',
    reading: '1.3M',
    method: 'Out of circuit, cold',
    findingId: c27,
  });
  await reading({
    ...voltage,
    location: 'V5 pin 3 (cathode), as found',
    expected: '8.5',
    reading: '12.8',
    conditions: 'After four minutes at full mains on the variable autotransformer, before any repair',
    findingId: c27,
  });
  await reading({ ...voltage, location: 'HT at can section A', expected: '265', reading: '271', ownerVisible: true });
  await reading({ ...voltage, location: 'V5 pin 7 (anode)', expected: '255', reading: '263' });
  await reading({ ...voltage, location: 'V5 pin 9 (screen)', expected: '235', reading: '244' });
  await reading({
    ...voltage,
    location: 'V5 pin 3 (cathode)',
    expected: '8.5',
    reading: '8.3',
    findingId: c27,
    ownerVisible: true,
  });
  await reading({ ...voltage, location: 'V4 pin 6 (triode anode)', expected: '95', reading: '88' });
  await reading({
    location: 'Mains pins to chassis',
    quantity: 'insulation',
    expected: '2M',
    reading: '180M',
    method: 'Insulation tester, 500 V DC, mains switch on',
    ownerVisible: true,
  });

  const ledger = partsService(db);
  const line = (p: Parameters<typeof ledger.create>[1]) => ledger.create(set.id, p, techId);
  await line({
    componentRef: 'C27',
    action: 'replaced',
    state: 'fitted',
    originalPart: 'Wax paper tubular',
    originalRating: '0.022µF 350V',
    replacementPart: 'Polyester film',
    replacementRating: '22nF 630V',
    costMinor: 55,
    source: 'New',
    testedAfter: 'V5 grid 0.1 V; cathode 8.3 V after an hour',
    findingId: c27,
  });
  await line({
    componentRef: 'R28',
    action: 'replaced',
    state: 'fitted',
    originalPart: 'Carbon composition, read 1.3 MΩ',
    originalRating: '470 kΩ ½ W',
    replacementPart: 'Metal film',
    replacementRating: '470 kΩ 0.6 W',
    costMinor: 20,
    source: 'New, bench stock',
    testedAfter: 'Reads 471 kΩ',
    findingId: c27,
  });
  await line({
    componentRef: 'V5',
    action: 'kept-original',
    state: 'fitted',
    originalPart: "EL84, the set's own",
    testedAfter: 'Emission good on the valve tester; no grid current',
    findingId: c27,
  });
  await line({
    componentRef: 'R20',
    action: 'kept-original',
    state: 'fitted',
    originalPart: 'Carbon-track volume control with double-pole switch',
    originalRating: '1 MΩ log',
    testedAfter: 'Cleaned; quiet end to end, no DC across the track',
    findingId: await ref('R20'),
  });
  await line({
    componentRef: 'C14',
    action: 'replaced',
    state: 'fitted',
    originalPart: 'Wax paper tubular',
    originalRating: '0.05µF 500V',
    replacementPart: 'Polyester film',
    replacementRating: '47nF 630V',
    costMinor: 35,
    source: 'New',
  });
  await line({
    componentRef: 'C12',
    action: 'replaced',
    state: 'fitted',
    originalPart: 'Paper, mains to chassis',
    originalRating: '0.01µF 750V',
    replacementPart: 'Class Y2 film',
    replacementRating: '10nF 300V AC',
    mainsPosition: 'line-to-chassis',
    costMinor: 65,
    source: 'New',
  });
  await line({
    componentRef: 'Speaker leads',
    action: 'replaced',
    state: 'planned',
    originalPart: 'Rubber-insulated flex to the speaker and deck motor',
    replacementPart: 'PVC-insulated flex',
    costMinor: 180,
    notes: 'Waiting on the owner: the leads are outside the chassis',
  });
}
