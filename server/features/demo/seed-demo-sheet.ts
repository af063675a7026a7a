import { recordEvent } from '../events/record-event';
import { mismatchesRepo } from '../mismatches/mismatches.repo';
import { randomUUID } from 'node:crypto';
import { rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { and, eq } from 'drizzle-orm';
import sharp from 'sharp';
import { photos, sheetPages } from '../../db/schema';
import type { PhotosDeps } from '../photos/photos.service';
import { referencesRepo } from '../references/references.repo';
import { sheetsService } from '../sheets/sheets.service';
import { chassisLandmarks } from './chassis';
import { demoSet, demoUserId, MERIDIAN_54 } from './demo-lookup';

const W = 2400;
const H = 1700;
type Symbol = { ref: string; x: number; y: number; value: string; kind: 'R' | 'C' };

/** The output stage of the demo set's own diagram: the EABC80 anode couples through C27 to the EL84 grid. */
const SYMBOLS: Symbol[] = [
  { ref: 'C27', x: 900, y: 600, value: '0,022µ 350V', kind: 'C' },
  { ref: 'R28', x: 1200, y: 900, value: '470k', kind: 'R' },
  { ref: 'R29', x: 1650, y: 1150, value: '150Ω 1W', kind: 'R' },
];

function symbolSvg(s: Symbol): string {
  const body =
    s.kind === 'R'
      ? `<rect x="${s.x - 18}" y="${s.y - 60}" width="36" height="120" fill="none" stroke="#111" stroke-width="3"/>`
      : `<path d="M${s.x - 10} ${s.y - 45} V${s.y + 45} M${s.x + 10} ${s.y - 45} V${s.y + 45}" stroke="#111" stroke-width="4"/>`;
  return `${body}<text x="${s.x + 40}" y="${s.y - 8}" font-family="sans-serif" font-size="30" fill="#111">${s.ref}</text>
    <text x="${s.x + 40}" y="${s.y + 26}" font-family="sans-serif" font-size="22" fill="#111">${s.value}</text>`;
}

/** A circuit diagram page drawn in code, thin lines and small print like a scanned sheet. */
function diagramSvg(): string {
  const wires =
    'M300 600 H890 M910 600 H1450 M1200 600 V840 M1200 960 V1400 M1650 1000 V1090 M1650 1210 V1400 M200 1400 H2200';
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}"><rect width="${W}" height="${H}" fill="#fbfaf5"/>
    <path d="${wires}" stroke="#111" stroke-width="3" fill="none"/>
    <circle cx="1600" cy="700" r="170" fill="none" stroke="#111" stroke-width="3"/>
    <text x="1540" y="710" font-family="sans-serif" font-size="34">V5 EL84</text>
    <text x="160" y="590" font-family="sans-serif" font-size="26">from V4 anode</text>
    ${SYMBOLS.map(symbolSvg).join('')}
    <text x="120" y="120" font-family="sans-serif" font-size="44" font-weight="bold">Ostrander &amp; Vale Meridian 54 — output stage</text>
    <text x="120" y="1620" font-family="sans-serif" font-size="16">Voltages measured to chassis with a 20 kΩ/V meter, no signal, mains 245 V.</text></svg>`;
}

/** A component-location page: the underside outline with each part where it sits. */
function layoutSvg(): string {
  const spots = chassisLandmarks('underside');
  const parts = ['C27', 'R28', 'R29', 'C30'].map((ref) => {
    const at = spots[ref]!;
    return `<circle cx="${at.x * W}" cy="${at.y * H}" r="26" fill="none" stroke="#111" stroke-width="3"/><text x="${at.x * W + 34}" y="${at.y * H + 10}" font-family="sans-serif" font-size="30">${ref}</text>`;
  });
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}"><rect width="${W}" height="${H}" fill="#fbfaf5"/>
    <rect x="80" y="80" width="${W - 160}" height="${H - 160}" fill="none" stroke="#111" stroke-width="4"/>
    <text x="120" y="150" font-family="sans-serif" font-size="40" font-weight="bold">Underside, component location</text>${parts.join('')}</svg>`;
}

/** The demo set's service sheet (a diagram and a layout page) with C27, R28 and R29 marked on it and on the underside photo. Runs once. */
export async function seedDemoSheet(deps: PhotosDeps): Promise<void> {
  const { db } = deps;
  const set = await demoSet(db, MERIDIAN_54);
  if (!set) return;
  if (
    (await db.select({ id: sheetPages.id }).from(sheetPages).where(eq(sheetPages.restorationId, set.id)).limit(1))
      .length
  )
    return;
  const techId = await demoUserId(db, 'technician');
  if (!techId) return;
  const service = sheetsService(deps);
  const pages: [string, 'circuit-diagram' | 'layout', string][] = [
    [diagramSvg(), 'circuit-diagram', 'Output stage'],
    [layoutSvg(), 'layout', 'Underside component location'],
  ];
  const ids: number[] = [];
  for (const [svg, kind, title] of pages) {
    const bytes = await sharp(Buffer.from(svg)).png().toBuffer();
    const file = path.join(os.tmpdir(), `gridleak-demo-sheet-${randomUUID()}.png`);
    await writeFile(file, bytes);
    try {
      const sheet = await service.ingest(
        set.id,
        { path: file, size: bytes.length, mimeType: 'image/png' },
        { kind, title },
        techId,
        'technician',
      );
      ids.push(sheet.pages[0]!.id);
    } finally {
      await rm(file, { force: true });
    }
  }
  const [underside] = await db
    .select({ id: photos.id })
    .from(photos)
    .where(and(eq(photos.restorationId, set.id), eq(photos.view, 'underside'), eq(photos.phase, 'before')));
  const spots = chassisLandmarks('underside');
  await db.transaction(async (tx) => {
    const repo = referencesRepo(tx);
    for (const s of SYMBOLS) {
      await repo.insertMark({
        restorationId: set.id,
        sheetPageId: ids[0]!,
        ref: s.ref,
        shape: 'pin',
        points: [{ x: s.x / W, y: s.y / H }],
        createdById: techId,
      });
      const at = spots[s.ref]!;
      await repo.insertMark({
        restorationId: set.id,
        sheetPageId: ids[1]!,
        ref: s.ref,
        shape: 'pin',
        points: [{ x: at.x, y: at.y }],
        createdById: techId,
      });
      if (underside)
        await repo.insertMark({
          restorationId: set.id,
          photoId: underside.id,
          ref: s.ref,
          shape: 'pin',
          points: [{ x: at.x, y: at.y }],
          createdById: techId,
        });
    }
    // The set as built differs from its sheet in one place, noted against the reference.
    const note = await mismatchesRepo(tx).insert({
      restorationId: set.id,
      ref: 'R29',
      kind: 'value-differs',
      diagramSays: '150Ω 1W',
      chassisHas: '180Ω 1W, original factory joints',
      note: 'Both Meridian 54 chassis on the Cobbold Lane bench carry 180Ω here; treat it as a production change, not a repair.',
      createdById: techId,
    });
    await recordEvent(tx, {
      restorationId: set.id,
      kind: 'mismatch-noted',
      actorId: techId,
      mismatchNoteId: note.id,
      data: { ref: 'R29' },
    });
  });
}
