import { and, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { findings, parts, restorations, users } from '../../db/schema';
import { demoPeople } from '../../db/seed/demo-scenario';
import { measurementsService } from '../measurements/measurements.service';
import { partsService } from '../parts/parts.service';

/** The Meridian 54's bench record: valve line-up, readings, parts ledger and care notes. Runs once. */
export async function seedDemoWorkshop(db: Database): Promise<void> {
  const [set] = await db.select().from(restorations).where(and(eq(restorations.make, 'Ostrander & Vale'), eq(restorations.serial, 'OV-54-20417')));
  if (!set) return;
  const [existing] = await db.select({ id: parts.id }).from(parts).where(eq(parts.restorationId, set.id)).limit(1);
  if (existing) return;
  const [tech] = await db.select({ id: users.id }).from(users).where(eq(users.email, demoPeople.technician.email));
  const techId = tech!.id;
  const ref = async (componentRef: string) =>
    (await db.select({ id: findings.id }).from(findings).where(and(eq(findings.restorationId, set.id), eq(findings.componentRef, componentRef))))[0]?.id ?? null;
  await db.update(restorations).set({
    careNotes: 'Give it a minute to warm up before turning the volume up. Keep the back on and the vents clear; it runs warm. The FM band needs the built-in dipole stretched out or an external aerial.',
  }).where(eq(restorations.id, set.id));

  const m = measurementsService(db);
  await m.setLineUp(set.id, ['ECC85', 'ECH81', 'EF89', 'EABC80', 'EL84', 'EM80', 'EZ80'].map((type, i) => ({ position: `V${i + 1}`, type, notes: '' })));
  const reading = (r: Parameters<typeof m.create>[1]) => m.create(set.id, r, techId);
  const voltage = { quantity: 'dc-voltage' as const, tolerance: '15', method: 'DMM, 10 MΩ input', conditions: '240 V mains on the 240 V tap, no signal, volume minimum' };
  await reading({ location: 'R23', quantity: 'resistance', expected: '150', tolerance: '10', reading: '212', method: 'Out of circuit, cold', findingId: await ref('R23') });
  await reading({ location: 'C30', quantity: 'esr', expected: '32µ', rating: '350 V', reading: '6.5 Ω', method: 'ESR meter, 100 kHz, in circuit', findingId: await ref('C30') });
  await reading({ location: 'C30 (restuffed)', quantity: 'esr', expected: '47µ', rating: '450 V', reading: '0.4 Ω', method: 'ESR meter, 100 kHz', findingId: await ref('C30'), ownerVisible: true });
  await reading({ ...voltage, location: 'HT at C30', expected: '250', reading: '262', ownerVisible: true });
  await reading({ ...voltage, location: 'V5 pin 7 (anode)', expected: '240', reading: '251' });
  await reading({ ...voltage, location: 'V5 pin 9 (screen)', expected: '250', reading: '259' });
  await reading({ ...voltage, location: 'V5 pin 3 (cathode)', expected: '7.5', reading: '7.4', findingId: await ref('R23') });
  await reading({ location: 'Mains pins to chassis', quantity: 'insulation', expected: '2M', reading: '200M', method: 'Insulation tester, 500 V DC, switch on', ownerVisible: true });

  const ledger = partsService(db);
  const line = (p: Parameters<typeof ledger.create>[1]) => ledger.create(set.id, p, techId);
  await line({ componentRef: 'R23', action: 'replaced', state: 'fitted', originalPart: 'Carbon composition', originalRating: '150 Ω 1 W', replacementPart: 'Metal film', replacementRating: '150 Ω 2 W', costMinor: 45, source: 'New, bench stock', testedAfter: 'Cathode 7.4 V (7.5 V expected)', findingId: await ref('R23') });
  await line({ componentRef: 'C31', action: 'replaced', state: 'fitted', originalPart: 'Tubular electrolytic', originalRating: '25µF 25V', replacementPart: 'Axial electrolytic 105 °C', replacementRating: '47µF 63V', costMinor: 60, source: 'New', testedAfter: 'ESR 0.3 Ω in circuit' });
  await line({ componentRef: 'C30', action: 'restuffed', state: 'fitted', originalPart: 'Tubular electrolytic', originalRating: '32µF 350V', replacementPart: 'Radial electrolytic inside the original tube', replacementRating: '47µF 450V', costMinor: 210, source: 'New', testedAfter: 'HT 262 V, hum gone', findingId: await ref('C30') });
  await line({ componentRef: 'C14', action: 'replaced', state: 'fitted', originalPart: 'Wax paper tubular', originalRating: '0.047µF 400V', replacementPart: 'Polyester film', replacementRating: '47nF 630V', costMinor: 35, source: 'New' });
  await line({ componentRef: 'C2', action: 'replaced', state: 'planned', originalPart: 'Paper, mains filter', originalRating: '0.01µF 750V', replacementPart: 'Film', replacementRating: '10nF 630V', mainsPosition: 'across-line', costMinor: 40, notes: 'Order an X2 part instead' });
  await line({ componentRef: 'C1', action: 'kept-original', state: 'fitted', originalPart: 'Silvered mica', originalRating: '100pF', testedAfter: 'Measured 101 pF, no leakage' });
}
