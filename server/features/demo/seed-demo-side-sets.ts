import { eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { valves } from '../../db/schema';
import { measurementsService } from '../measurements/measurements.service';
import { partsService } from '../parts/parts.service';
import { demoSet } from './demo-lookup';

type Reading = Parameters<ReturnType<typeof measurementsService>['create']>[1];
type Line = Parameters<ReturnType<typeof partsService>['create']>[1];

interface SideSet {
  make: string;
  serial: string;
  lineUp: [type: string, notes: string][];
  readings: Reading[];
  parts: Line[];
}

/**
 * The bench record of the demo's two other sets: the Wren, an AC/DC set dead with an open dropper
 * section, and the Tonecraft, an amplifier humming from a dried-out reservoir can. No photos yet.
 */
const sideSets: SideSet[] = [
  {
    make: 'Kestrel Wireless Co.',
    serial: 'KW-3381',
    lineUp: [
      ['UCH42', ''],
      ['UF41', ''],
      ['UBC41', ''],
      ['UL41', 'Heater reads continuous'],
      ['UY41', ''],
    ],
    readings: [
      {
        location: 'Mains pins to chassis',
        quantity: 'insulation',
        expected: '2M',
        reading: '40M',
        method: 'Insulation tester, 500 V DC, set unplugged, switch on',
      },
      {
        location: 'C21 (reservoir)',
        quantity: 'capacitance',
        expected: '32µ',
        tolerance: '-20/+50',
        reading: '30µ',
        method: 'LCR meter at 100 Hz, one end lifted',
      },
    ],
    parts: [
      {
        componentRef: 'R30',
        action: 'replaced',
        state: 'ordered',
        originalPart: 'Wire-wound dropper, second section open',
        replacementPart: 'Wire-wound resistor of the section’s value, 10 W, bridged across the open section',
        costMinor: 240,
        source: 'New',
        notes: 'Measure the good sections first; keep the dropper itself so it looks original',
      },
      {
        componentRef: 'Mains lead',
        action: 'replaced',
        state: 'planned',
        originalPart: 'Two-core rubber flex',
        replacementPart: 'Two-core PVC flex',
        costMinor: 150,
      },
    ],
  },
  {
    make: 'Halverson',
    serial: 'HT12-0988',
    lineUp: [
      ['ECC83', 'Left preamplifier'],
      ['ECC83', 'Right preamplifier'],
      ['ECL86', 'Left output'],
      ['ECL86', 'Right output'],
      ['EZ81', ''],
    ],
    readings: [
      {
        location: 'C1a (reservoir)',
        quantity: 'capacitance',
        expected: '32µ',
        tolerance: '-20/+50',
        reading: '6.8µ',
        method: 'LCR meter at 100 Hz, out of circuit',
      },
      {
        location: 'C1a (reservoir)',
        quantity: 'esr',
        expected: '32µ',
        rating: '350 V',
        reading: '9.5 Ω',
        method: 'ESR meter, 100 kHz, out of circuit',
      },
      {
        location: 'C1b (smoothing)',
        quantity: 'capacitance',
        expected: '32µ',
        tolerance: '-20/+50',
        reading: '29µ',
        method: 'LCR meter at 100 Hz, out of circuit',
      },
    ],
    parts: [
      {
        componentRef: 'C1',
        action: 'restuffed',
        state: 'ordered',
        originalPart: 'Can electrolytic, dried out',
        originalRating: '32+32µF 350V',
        replacementPart: 'Two radial electrolytics hidden in the original can',
        replacementRating: '33µF 500V',
        costMinor: 420,
        source: 'New',
      },
    ],
  },
];

/** Seeds each side set's line-up, readings and parts once; a set that already has a line-up is left alone. */
export async function seedDemoSideSets(db: Database, techId: number): Promise<void> {
  const m = measurementsService(db);
  const ledger = partsService(db);
  for (const s of sideSets) {
    const set = await demoSet(db, s);
    if (!set) continue;
    const [existing] = await db.select({ id: valves.id }).from(valves).where(eq(valves.restorationId, set.id)).limit(1);
    if (existing) continue;
    await m.setLineUp(
      set.id,
      s.lineUp.map(([type, notes], i) => ({ position: `V${i + 1}`, type, notes })),
    );
    for (const r of s.readings) await m.create(set.id, r, techId);
    for (const p of s.parts) await ledger.create(set.id, p, techId);
  }
}
