import { describe, expect, it } from 'vitest';
import { imagePoint, imageToStage } from '../model/coordinates';
import { PIN_MARKER_RADIUS_PX } from '../model/hit-test';
import { statusStyle } from '../../../lib/finding-legend';
import { drawMarks, LABEL_RADIUS_PX } from './draw-marks';
import type { Mark } from './marks';
import { recordingPen } from '../testing/recording-pen';

const image = { width: 4000, height: 3000 };
const stage = { width: 800, height: 600 };
const fit = { scale: 0.2, x: 0, y: 0 };
const pin = (id: number, x: number, y: number, extra: Partial<Mark> = {}): Mark => ({
  id,
  number: id,
  shape: 'pin',
  points: [imagePoint(x, y)],
  status: 'confirmed',
  severity: 'fault',
  ...extra,
});
const texts = (calls: ReturnType<typeof recordingPen>['calls']) =>
  calls.filter((c) => c.op === 'fillText').map((c) => c.args[0]);

describe('drawMarks', () => {
  it('when a pin is drawn, then its number and status glyph are written at its stage position', () => {
    const pen = recordingPen();
    drawMarks(pen, [pin(3, 0.25, 0.5)], fit, image, stage);
    const at = imageToStage(imagePoint(0.25, 0.5), fit, image);
    const number = pen.calls.find((c) => c.op === 'fillText' && c.args[0] === '3');
    expect(number?.args.slice(1)).toEqual([at.x, at.y]);
    expect(texts(pen.calls)).toContain(statusStyle('confirmed').glyph);
    // Filled in the status colour.
    expect(pen.calls.some((c) => c.op === 'fill' && c.fillStyle === statusStyle('confirmed').colour)).toBe(true);
  });

  it('when the zoom changes, then a pin marker keeps its screen size', () => {
    const radii = [0.1, 1, 8].map((scale) => {
      const pen = recordingPen();
      drawMarks(pen, [pin(1, 0.5, 0.5, { severity: 'cosmetic' })], { scale, x: 0, y: 0 }, image, {
        width: 1e6,
        height: 1e6,
      });
      return pen.calls.find((c) => c.op === 'arc')?.args[2];
    });
    expect(radii).toEqual([PIN_MARKER_RADIUS_PX, PIN_MARKER_RADIUS_PX, PIN_MARKER_RADIUS_PX]);
  });

  it('when a rect is drawn, then it is stroked from its stage corners in the status colour and labelled at its top-left', () => {
    const pen = recordingPen();
    const rect: Mark = {
      ...pin(2, 0, 0),
      shape: 'rect',
      points: [imagePoint(0.1, 0.2), imagePoint(0.3, 0.4)],
      status: 'repaired',
      severity: 'cosmetic',
    };
    drawMarks(pen, [rect], fit, image, stage);
    expect(pen.calls.find((c) => c.op === 'rect')?.args).toEqual([80, 120, 160, 120]);
    expect(pen.calls.some((c) => c.op === 'stroke' && c.strokeStyle === statusStyle('repaired').colour)).toBe(true);
    // The label is a circle marker (cosmetic) of the label radius, centred on the corner.
    expect(pen.calls.find((c) => c.op === 'arc')?.args.slice(0, 3)).toEqual([80, 120, LABEL_RADIUS_PX]);
  });

  it('when marks lie off the stage or are being dragged, then they are not drawn', () => {
    const pen = recordingPen();
    const zoomed = { scale: 1, x: 0, y: 0 }; // the stage shows image px 0..800 × 0..600
    const drawn = drawMarks(pen, [pin(1, 0.05, 0.05), pin(2, 0.9, 0.9), pin(3, 0.1, 0.1)], zoomed, image, stage, 3);
    expect(drawn).toBe(1);
    expect(texts(pen.calls)).toContain('1');
    expect(texts(pen.calls)).not.toContain('2');
    expect(texts(pen.calls)).not.toContain('3');
  });
});
