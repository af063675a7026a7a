import { randomUUID } from 'node:crypto';
import { rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { and, eq } from 'drizzle-orm';
import sharp from 'sharp';
import type { PhotoUploadFields } from '../../../shared/schemas/photos';
import { photos, restorations, users } from '../../db/schema';
import { demoPeople } from '../../db/seed/demo-scenario';
import { photosService, type PhotosDeps } from '../photos/photos.service';
import { chassisLandmarks, renderChassisJpeg } from './chassis';

/** The demo set's chassis pictures, loaded through the same pipeline as any upload. Runs once per set. */
export async function seedDemoPhotos(deps: PhotosDeps): Promise<void> {
  const { db } = deps;
  const [set] = await db.select().from(restorations).where(and(eq(restorations.make, 'Ostrander & Vale'), eq(restorations.serial, 'OV-54-20417')));
  if (!set) return;
  const have = new Set((await db.select({ caption: photos.caption }).from(photos).where(eq(photos.restorationId, set.id))).map((p) => p.caption));
  const [tech] = await db.select({ id: users.id }).from(users).where(eq(users.email, demoPeople.technician.email));
  const service = photosService(deps);
  const shots: [() => Promise<Buffer>, PhotoUploadFields & { caption: string }][] = [
    [() => renderChassisJpeg('top'), { view: 'top', phase: 'before', caption: 'Top of the chassis as received, valves in place', ownerVisible: true }],
    [() => renderChassisJpeg('underside'), { view: 'underside', phase: 'before', caption: 'Underside before any work: note the scorching around R23', ownerVisible: true }],
    [async () => closeUp(await renderChassisJpeg('underside'), 'R23'), { view: 'detail', phase: 'before', caption: 'R23 and C31, the cathode resistor and its bypass capacitor', ownerVisible: false }],
    [() => renderChassisJpeg('top', 'after'), { view: 'top', phase: 'after', caption: 'Top after cleaning; the can capacitor restuffed', ownerVisible: true }],
    [() => renderChassisJpeg('underside', 'after'), { view: 'underside', phase: 'after', caption: 'Underside after the work: new R23 and C31, C30 restuffed, new HT lead', ownerVisible: true }],
  ];
  for (const [render, fields] of shots) {
    if (have.has(fields.caption)) continue;
    const bytes = await render();
    const file = path.join(os.tmpdir(), `gridleak-demo-${randomUUID()}.jpg`);
    await writeFile(file, bytes);
    try {
      await service.ingest(set.id, { path: file, size: bytes.length }, fields, tech?.id ?? null);
    } finally {
      await rm(file, { force: true });
    }
  }
}

/** A detail shot cropped around a landmark of the underside picture, as a close-up photo would be. */
async function closeUp(underside: Buffer, landmark: string): Promise<Buffer> {
  const spot = chassisLandmarks('underside')[landmark]!;
  const [w, h] = [2400, 1600];
  const size = 700;
  const left = Math.max(0, Math.min(w - size, Math.round(spot.x * w - size / 2)));
  const top = Math.max(0, Math.min(h - size, Math.round(spot.y * h - size / 2)));
  return sharp(underside).extract({ left, top, width: size, height: size }).resize(1400).jpeg({ quality: 88 }).toBuffer();
}
