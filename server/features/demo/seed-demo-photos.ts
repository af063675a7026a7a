import { randomUUID } from 'node:crypto';
import { rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import type { PhotoUploadFields } from '../../../shared/schemas/photos';
import { photos } from '../../db/schema';
import { photosService, type PhotosDeps } from '../photos/photos.service';
import { chassisLandmarks, renderChassisJpeg } from './chassis';
import { demoSet, demoUserId, MERIDIAN_54 } from './demo-lookup';

/** The demo set's chassis pictures, loaded through the same pipeline as any upload. Runs once per set. */
export async function seedDemoPhotos(deps: PhotosDeps): Promise<void> {
  const { db } = deps;
  const set = await demoSet(db, MERIDIAN_54);
  if (!set) return;
  const have = new Set(
    (await db.select({ caption: photos.caption }).from(photos).where(eq(photos.restorationId, set.id))).map(
      (p) => p.caption,
    ),
  );
  const techId = await demoUserId(db, 'technician');
  const service = photosService(deps);
  const shots: [() => Promise<Buffer>, PhotoUploadFields & { caption: string }][] = [
    [
      () => renderChassisJpeg('top'),
      {
        view: 'top',
        phase: 'before',
        caption: 'Top of the chassis out of the cabinet, valves in place',
        ownerVisible: true,
      },
    ],
    [
      () => renderChassisJpeg('underside'),
      {
        view: 'underside',
        phase: 'before',
        caption: 'Underside before any work: wax run out of C27 by the output valve',
        ownerVisible: true,
      },
    ],
    [
      async () => closeUp(await renderChassisJpeg('underside'), 'C27'),
      {
        view: 'detail',
        phase: 'before',
        caption: 'C27, the coupling capacitor to the EL84 grid, with the grid leak R28 beside it',
        ownerVisible: false,
      },
    ],
    [
      () => renderChassisJpeg('top', 'after'),
      {
        view: 'top',
        phase: 'after',
        caption: 'Top after cleaning; every valve tested and back in its own socket',
        ownerVisible: true,
      },
    ],
    [
      () => renderChassisJpeg('underside', 'after'),
      {
        view: 'underside',
        phase: 'after',
        caption:
          'Underside after the work: new C27 and R28, wax tubulars replaced with film, new lead to the rectifier',
        ownerVisible: true,
      },
    ],
  ];
  for (const [render, fields] of shots) {
    if (have.has(fields.caption)) continue;
    const bytes = await render();
    const file = path.join(os.tmpdir(), `gridleak-demo-${randomUUID()}.jpg`);
    await writeFile(file, bytes);
    try {
      await service.ingest(set.id, { path: file, size: bytes.length }, fields, techId ?? null);
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
  return sharp(underside)
    .extract({ left, top, width: size, height: size })
    .resize(1400)
    .jpeg({ quality: 88 })
    .toBuffer();
}
