import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';
import { chassisLandmarks, plainChassisSpot } from './chassis-landmarks';
import type { ChassisView } from './chassis-landmarks';
import { resistorBands } from './colour-code';
import { chassisSvg, renderChassisJpeg } from './render-chassis';

const VIEWS: readonly ChassisView[] = ['top', 'underside'];
const jpegs = new Map<ChassisView, Buffer>();

beforeAll(async () => {
  for (const view of VIEWS) jpegs.set(view, await renderChassisJpeg(view));
}, 60_000);

function jpeg(view: ChassisView): Buffer {
  const buf = jpegs.get(view);
  if (!buf) throw new Error(`${view} was not rendered`);
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
  it.each(VIEWS)('when the %s view is rendered, then it is a 2400 × 1600 JPEG', async (view) => {
    const meta = await sharp(jpeg(view)).metadata();
    expect(meta.format).toBe('jpeg');
    expect(meta.width).toBe(2400);
    expect(meta.height).toBe(1600);
  });

  it.each(VIEWS)('when the %s view is drawn twice, then both drawings are identical', (view) => {
    expect(chassisSvg(view)).toBe(chassisSvg(view));
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
      expect.arrayContaining(['R23', 'C30', 'crackedLead', 'V5socket']),
    );
  });

  it('when sampled at R23, then the charred resistor is darker than bare chassis', async () => {
    const r23 = chassisLandmarks('underside').R23;
    if (!r23) throw new Error('no R23 landmark');
    const plain = plainChassisSpot('underside');
    const charred = await luminanceAt(jpeg('underside'), r23.x, r23.y);
    const bare = await luminanceAt(jpeg('underside'), plain.x, plain.y);
    expect(charred).toBeLessThan(bare - 40);
  });

  it('when sampled at the bare-chassis spot of the top view, then it is mid-grey steel', async () => {
    const plain = plainChassisSpot('top');
    const lum = await luminanceAt(jpeg('top'), plain.x, plain.y);
    expect(lum).toBeGreaterThan(100);
    expect(lum).toBeLessThan(230);
  });
});

describe('resistor colour bands', () => {
  // IEC 60062 colour code: digits black 0 … white 9; multiplier by the same colours
  // (gold ×0.1, silver ×0.01); tolerance gold ±5 %, silver ±10 %, no band ±20 %.
  it('when a value is 150 Ω, then it reads brown green brown gold', () => {
    expect(resistorBands(150)).toEqual(['brown', 'green', 'brown', 'gold']);
  });

  it('when a value is 1 MΩ, then it reads brown black green gold', () => {
    expect(resistorBands(1e6)).toEqual(['brown', 'black', 'green', 'gold']);
  });

  it('when a value is 47 kΩ, then it reads yellow violet orange gold', () => {
    expect(resistorBands(47e3)).toEqual(['yellow', 'violet', 'orange', 'gold']);
  });

  it('when values sit at the ends of the scale, then the multiplier band follows', () => {
    expect(resistorBands(220e3)).toEqual(['red', 'red', 'yellow', 'gold']);
    expect(resistorBands(2.2e3)).toEqual(['red', 'red', 'red', 'gold']);
    expect(resistorBands(4.7)).toEqual(['yellow', 'violet', 'gold', 'gold']);
    expect(resistorBands(470e3, 10)).toEqual(['yellow', 'violet', 'yellow', 'silver']);
    expect(resistorBands(10e3, 20)).toEqual(['brown', 'black', 'orange']);
  });

  it('when a value needs three significant digits, then it is refused', () => {
    expect(() => resistorBands(1234)).toThrow(RangeError);
    expect(() => resistorBands(0)).toThrow(RangeError);
  });
});
