import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';
import { chassisLandmarks, plainChassisSpot } from './chassis-landmarks';
import type { ChassisView } from './chassis-landmarks';
import { bodyCentre } from './chassis-parts-underside';
import { HT_LEAD_ROUTE, undersideParts } from './chassis-restoration';
import type { ChassisState } from './chassis-restoration';
import { BAND_PAINT } from './band-paint';
import { chassisSvg, renderChassisJpeg } from './render-chassis';
import { HEIGHT, WIDTH } from './svg-kit';

const VIEWS: readonly ChassisView[] = ['top', 'underside'];
const STATES: readonly ChassisState[] = ['before', 'after'];
const jpegs = new Map<string, Buffer>();

beforeAll(async () => {
  for (const view of VIEWS) {
    jpegs.set(view, await renderChassisJpeg(view));
    jpegs.set(`${view}/after`, await renderChassisJpeg(view, 'after'));
  }
}, 120_000);

function jpeg(view: ChassisView, state: ChassisState = 'before'): Buffer {
  const buf = jpegs.get(state === 'before' ? view : `${view}/${state}`);
  if (!buf) throw new Error(`${view} (${state}) was not rendered`);
  return buf;
}

/** Mean luminance (0..255) of a 9 × 9 patch centred on a normalised point. */
async function luminanceAt(buf: Buffer, x: number, y: number): Promise<number> {
  const { data, info } = await sharp(buf).raw().toBuffer({ resolveWithObject: true });
  const cx = Math.round(x * info.width);
  const cy = Math.round(y * info.height);
  let sum = 0;
  let n = 0;
  for (let dy = -4; dy <= 4; dy++) {
    for (let dx = -4; dx <= 4; dx++) {
      const i = ((cy + dy) * info.width + (cx + dx)) * info.channels;
      sum += 0.2126 * (data[i] ?? 0) + 0.7152 * (data[i + 1] ?? 0) + 0.0722 * (data[i + 2] ?? 0);
      n++;
    }
  }
  return sum / n;
}

describe('demo chassis pictures', () => {
  const BOTH = VIEWS.flatMap((view) => STATES.map((state) => [view, state] as const));

  it.each(BOTH)('when the %s view (%s) is rendered, then it is a 2400 × 1600 JPEG', async (view, state) => {
    const meta = await sharp(jpeg(view, state)).metadata();
    expect(meta.format).toBe('jpeg');
    expect(meta.width).toBe(2400);
    expect(meta.height).toBe(1600);
  });

  it.each(BOTH)('when the %s view (%s) is drawn twice, then both drawings are identical', (view, state) => {
    expect(chassisSvg(view, state)).toBe(chassisSvg(view, state));
  });

  it.each(VIEWS)('when the %s view is drawn after the work, then the picture has changed', (view) => {
    expect(chassisSvg(view, 'after')).not.toBe(chassisSvg(view, 'before'));
  });

  it.each(STATES)('when the underside is drawn %s the work, then every part sits on its landmark', (state) => {
    const marks = chassisLandmarks('underside');
    const p = undersideParts(state);
    const parts = [...p.resistors, ...p.waxCaps, ...p.films, ...p.electrolytics, ...p.newElectrolytics];
    expect(parts.map((x) => x.ref).sort()).toEqual([
      'C12',
      'C14',
      'C23',
      'C26',
      'C27',
      'C30',
      'R1',
      'R12',
      'R13',
      'R15',
      'R16',
      'R18',
      'R19',
      'R28',
      'R29',
      'R6',
      'R8',
    ]);
    for (const part of parts) {
      const [x, y] = bodyCentre(part.a, part.b, part.lift);
      expect.soft(x / WIDTH, `${part.ref}.x`).toBeCloseTo(marks[part.ref]?.x ?? NaN, 9);
      expect.soft(y / HEIGHT, `${part.ref}.y`).toBeCloseTo(marks[part.ref]?.y ?? NaN, 9);
    }
    const lead = marks.crackedLead;
    expect(HT_LEAD_ROUTE.some(([x, y]) => x / WIDTH === lead?.x && y / HEIGHT === lead.y)).toBe(true);
  });

  it.each(VIEWS)('every %s landmark lies inside the picture', (view) => {
    for (const [name, m] of Object.entries(chassisLandmarks(view))) {
      expect.soft(m.x, `${name}.x`).toBeGreaterThanOrEqual(0);
      expect.soft(m.x, `${name}.x`).toBeLessThanOrEqual(1);
      expect.soft(m.y, `${name}.y`).toBeGreaterThanOrEqual(0);
      expect.soft(m.y, `${name}.y`).toBeLessThanOrEqual(1);
      expect.soft(m.r, `${name}.r`).toBeGreaterThan(0);
      expect.soft(m.r, `${name}.r`).toBeLessThan(0.5);
      expect.soft(m.label, `${name}.label`).not.toBe('');
    }
  });

  it('names the parts that demo findings are pinned to', () => {
    expect(Object.keys(chassisLandmarks('top'))).toEqual(
      expect.arrayContaining(['canCapacitor', 'V5', 'V7', 'mainsTransformer']),
    );
    expect(Object.keys(chassisLandmarks('underside'))).toEqual(
      expect.arrayContaining(['C27', 'R28', 'crackedLead', 'volumeControl', 'V5socket']),
    );
  });

  /** The drawing of one referenced part, as grouped under `part-<ref>`. */
  const partSvg = (svg: string, ref: string): string => {
    const start = svg.indexOf(`<g id="part-${ref}">`);
    expect(start, `part-${ref} is drawn`).toBeGreaterThan(0);
    const next = svg.indexOf('<g id="part-', start + 1);
    return svg.slice(start, next < 0 ? undefined : next);
  };

  it('when the underside is drawn as found, then C27 is the old wax tubular, its print readable', () => {
    const drawn = partSvg(chassisSvg('underside'), 'C27');
    expect(drawn).toContain('0,022µ 350V');
  });

  it('when the underside is drawn after the work, then C27 is a film capacitor of at least the old voltage', () => {
    const drawn = partSvg(chassisSvg('underside', 'after'), 'C27');
    expect(drawn).not.toContain('0,022µ 350V');
    expect(drawn).toContain('22nJ');
    expect(drawn).toContain('630V');
  });

  it('when the new R28 is drawn, then its bands read yellow violet yellow gold', () => {
    // IEC 60062 colour code: 4 (yellow), 7 (violet), ×10 000 (yellow), ±5 % (gold) is 470 kΩ.
    const drawn = partSvg(chassisSvg('underside', 'after'), 'R28');
    const byPaint = new Map(Object.entries(BAND_PAINT).map(([band, paint]) => [paint, band]));
    const bands = [...drawn.matchAll(/fill="(#[0-9a-f]{6})"/g)].flatMap((m) => byPaint.get(m[1] ?? '') ?? []);
    expect(bands).toEqual(['yellow', 'violet', 'yellow', 'gold']);
  });

  it.each(STATES)(
    'when sampled at the bare-chassis spot of the top view (%s), then it is mid-grey steel',
    async (state) => {
      const plain = plainChassisSpot('top');
      const lum = await luminanceAt(jpeg('top', state), plain.x, plain.y);
      expect(lum).toBeGreaterThan(100);
      expect(lum).toBeLessThan(230);
    },
  );
});
