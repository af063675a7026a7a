import { describe, expect, it } from 'vitest';
import { imagePoint } from './coordinates';
import {
  crosshairDraft,
  crosshairEnter,
  CROSSHAIR_SHIFT_STEP_PX,
  CROSSHAIR_STEP_PX,
  describeCrosshair,
  followCrosshair,
  moveCrosshair,
  startCrosshair,
  type MarkLike,
} from './crosshair';

// A 4000×3000 photo shown at 0.2 stage px per image px from the stage's top-left: 800×600 stage px.
const ctx = { view: { scale: 0.2, x: 0, y: 0 }, image: { width: 4000, height: 3000 } };
const stage = { width: 800, height: 600 };
const pin3: MarkLike = { id: 30, number: 3, shape: 'pin', points: [imagePoint(0.42, 0.61)] };

describe('the keyboard crosshair', () => {
  it('when it first appears, then it sits in the middle of what the stage shows', () => {
    expect(startCrosshair(ctx.view, ctx.image, stage).at).toEqual({ x: 0.5, y: 0.5 });
    // Panned so that only the photo's right part shows: still the stage's middle, in photo terms.
    expect(startCrosshair({ scale: 0.2, x: -400, y: 0 }, ctx.image, stage).at).toEqual({ x: 1, y: 0.5 });
  });

  it('when an arrow is pressed, then it moves a fixed distance on screen, further with Shift, and stops at the edge', () => {
    const s = { at: imagePoint(0.5, 0.5) };
    const right = moveCrosshair(s, 1, 0, false, ctx);
    expect((right.at.x - 0.5) * 4000 * 0.2).toBeCloseTo(CROSSHAIR_STEP_PX, 9);
    const up = moveCrosshair(s, 0, -1, true, ctx);
    expect((0.5 - up.at.y) * 3000 * 0.2).toBeCloseTo(CROSSHAIR_SHIFT_STEP_PX, 9);
    // Twice as far in: each press covers half as much of the photo.
    const zoomed = moveCrosshair(s, 1, 0, false, { ...ctx, view: { ...ctx.view, scale: 0.4 } });
    expect(zoomed.at.x - 0.5).toBeCloseTo((right.at.x - 0.5) / 2, 12);
    expect(moveCrosshair({ at: imagePoint(0.999, 0) }, 1, -1, true, ctx).at).toEqual({ x: 1, y: 0 });
  });

  it('when Enter is pressed with the pin tool, then a pin is made at the crosshair', () => {
    const r = crosshairEnter('pin', { at: imagePoint(0.3, 0.4) }, ctx, []);
    expect(r.kind).toBe('create');
    expect(r.kind === 'create' && r.command).toEqual({ type: 'create', shape: 'pin', points: [{ x: 0.3, y: 0.4 }] });
  });

  it('when Enter starts a box and, after moving, finishes it, then the box spans the two points whichever way it went', () => {
    const started = crosshairEnter('rect', { at: imagePoint(0.6, 0.7) }, ctx, []);
    expect(started.kind).toBe('started');
    expect(started.state.anchor).toEqual({ x: 0.6, y: 0.7 });
    const moved = { ...started.state, at: imagePoint(0.4, 0.5) };
    expect(crosshairDraft('rect', moved)?.points).toEqual([
      { x: 0.4, y: 0.5 },
      { x: 0.6, y: 0.7 },
    ]);
    const done = crosshairEnter('rect', moved, ctx, []);
    expect(done.kind === 'create' && done.command).toEqual({
      type: 'create',
      shape: 'rect',
      points: [
        { x: 0.4, y: 0.5 },
        { x: 0.6, y: 0.7 },
      ],
    });
    expect(done.state.anchor).toBeUndefined();
  });

  it('when a second Enter comes at the same spot, then nothing is made and the shape waits', () => {
    const started = crosshairEnter('circle', { at: imagePoint(0.5, 0.5) }, ctx, []);
    const again = crosshairEnter('circle', started.state, ctx, []);
    expect(again.kind).toBe('too-small');
    expect(again.state.anchor).toEqual({ x: 0.5, y: 0.5 });
  });

  it('when Enter is pressed with Select, then it picks the finding under the crosshair, or clears the selection', () => {
    expect(crosshairEnter('select', { at: imagePoint(0.42, 0.61) }, ctx, [pin3])).toMatchObject({
      kind: 'select',
      id: 30,
    });
    expect(crosshairEnter('select', { at: imagePoint(0.9, 0.1) }, ctx, [pin3])).toMatchObject({
      kind: 'select',
      id: null,
    });
  });

  it('when screen readers ask where it is, then they hear across and down in per cent, and the finding it is near', () => {
    // 0.43 × 800 = 344 px, 8 px from the pin at 336 px: within NEAR_PX.
    expect(describeCrosshair('pin', { at: imagePoint(0.43, 0.61) }, ctx, [pin3])).toBe(
      '43 % across, 61 % down, near #3',
    );
    expect(describeCrosshair('pin', { at: imagePoint(0.9, 0.1) }, ctx, [pin3])).toBe('90 % across, 10 % down');
    expect(describeCrosshair('arrow', { at: imagePoint(0.9, 0.1), anchor: imagePoint(0.5, 0.25) }, ctx, [])).toBe(
      '90 % across, 10 % down. Started at 50 % across, 25 % down; Enter finishes it.',
    );
  });

  it('when it moves off the stage, then the view is panned just enough to bring it back', () => {
    expect(followCrosshair(imagePoint(0.5, 0.5), ctx, stage)).toEqual({ dx: 0, dy: 0 });
    // x = 1.0 → 800 px, 24 px margin → pan 24 px left; y = 0 → 0 px → pan 24 px down.
    expect(followCrosshair(imagePoint(1, 0), ctx, stage)).toEqual({ dx: -24, dy: 24 });
  });
});
