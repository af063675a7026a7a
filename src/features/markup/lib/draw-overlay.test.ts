import { describe, expect, it } from 'vitest';
import { imagePoint } from '../model/coordinates';
import { drawOverlay, HANDLE_PX } from './draw-overlay';
import type { Mark } from './marks';
import { DRAFT_COLOUR } from './pen';
import { recordingPen } from '../testing/recording-pen';

const image = { width: 1000, height: 1000 };
const view = { scale: 1, x: 0, y: 0 };
const rect: Mark = {
  id: 4,
  number: 4,
  shape: 'rect',
  points: [imagePoint(0.1, 0.1), imagePoint(0.3, 0.2)],
  status: 'observed',
  severity: 'wear',
};
const handleRects = (calls: ReturnType<typeof recordingPen>['calls']) =>
  calls.filter((c) => c.op === 'rect' && c.args[2] === HANDLE_PX);

describe('drawOverlay', () => {
  it('when the selected finding may be edited, then its four corner handles are drawn; otherwise only its outline', () => {
    const editable = recordingPen();
    drawOverlay(editable, { selected: rect, editable: true }, view, image);
    expect(handleRects(editable.calls).map((c) => c.args.slice(0, 2))).toEqual([
      [92, 92],
      [292, 92],
      [92, 192],
      [292, 192],
    ]);
    const readOnly = recordingPen();
    drawOverlay(readOnly, { selected: rect, editable: false }, view, image);
    expect(handleRects(readOnly.calls)).toHaveLength(0);
    expect(readOnly.calls.some((c) => c.op === 'stroke' && c.strokeStyle === DRAFT_COLOUR)).toBe(true);
  });

  it('when the selected finding is dragged, then it and its handles follow the draft', () => {
    const pen = recordingPen();
    const draft = { id: 4, shape: 'rect' as const, points: [imagePoint(0.5, 0.5), imagePoint(0.7, 0.6)] };
    drawOverlay(pen, { draft, dragging: rect, selected: rect, editable: true }, view, image);
    expect(pen.calls.find((c) => c.op === 'rect')?.args).toEqual([500, 500, 200, 100]);
    expect(handleRects(pen.calls)[0]?.args.slice(0, 2)).toEqual([492, 492]);
  });

  it('when a new mark is being drawn or awaits its title, then it is dashed in the accent colour', () => {
    const pen = recordingPen();
    drawOverlay(
      pen,
      { pending: { shape: 'arrow', points: [imagePoint(0.1, 0.1), imagePoint(0.2, 0.2)] }, editable: false },
      view,
      image,
    );
    const dashes = pen.calls.filter((c) => c.op === 'setLineDash' && (c.args[0] as number[]).length > 0);
    expect(dashes.length).toBeGreaterThan(0);
    expect(pen.calls.some((c) => c.op === 'fillText' && c.args[0] === '+')).toBe(true);
  });
});
