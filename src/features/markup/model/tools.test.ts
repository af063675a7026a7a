import { describe, expect, it } from 'vitest';
import { imagePoint } from './coordinates';
import type { MarkupItem } from './geometry';
import type { Grab } from './hit-test';
import { idle, transition, type Tool, type ToolContext, type ToolEvent, type ToolResult } from './tools';

// A 1000×1000 px photo at actual size: 1 image px = 1 stage px = 0.001 normalised.
const ctx: ToolContext = { view: { scale: 1, x: 0, y: 0 }, image: { width: 1000, height: 1000 } };
const at = (xPx: number, yPx: number) => imagePoint(xPx / 1000, yPx / 1000);
const down = (x: number, y: number): ToolEvent => ({ type: 'down', point: at(x, y) });
const move = (x: number, y: number): ToolEvent => ({ type: 'move', point: at(x, y) });
const up = (x: number, y: number): ToolEvent => ({ type: 'up', point: at(x, y) });
const escape: ToolEvent = { type: 'escape' };

/** Feed events through one tool; `grabs` gives the select tool what lay under each pointer-down. */
function run(tool: Tool, events: ToolEvent[], context: ToolContext = ctx, grab: Grab | null = null): ToolResult[] {
  const results: ToolResult[] = [];
  let state = idle;
  for (const event of events) {
    const result = transition(tool, state, event, event.type === 'down' ? { ...context, grab } : context);
    results.push(result);
    state = result.state;
  }
  return results;
}
const last = (results: ToolResult[]): ToolResult => results[results.length - 1] ?? { state: idle };
/** Image px, rounded to a millionth, so float noise from adding deltas does not fail an exact comparison. */
const px = (points: readonly { x: number; y: number }[] | undefined) =>
  points?.map((q) => [Math.round(q.x * 1e9) / 1e6, Math.round(q.y * 1e9) / 1e6]);

describe('pin tool', () => {
  it('when the photo is clicked, then a pin is created there and the tool is idle again', () => {
    const results = run('pin', [down(100, 200), up(100, 200)]);
    expect(results[0]?.state.phase).toBe('pointing');
    expect(results[0]?.draft).toEqual({ shape: 'pin', points: [at(100, 200)] });
    expect(last(results)).toEqual({ state: idle, command: { type: 'create', shape: 'pin', points: [at(100, 200)] } });
  });

  it('when the pointer is pressed and adjusted before release, then the pin lands where it is released', () => {
    expect(last(run('pin', [down(100, 200), move(130, 210), up(140, 220)])).command).toMatchObject({
      points: [at(140, 220)],
    });
  });

  it('when Escape is pressed before release, then the draft is dropped and nothing is created', () => {
    const results = run('pin', [down(100, 200), escape, up(100, 200)]);
    expect(results[1]).toEqual({ state: idle });
    expect(last(results).command).toBeUndefined();
  });

  it('when released off the photo, then the pin is placed on its edge', () => {
    const results = run('pin', [
      { type: 'down', point: imagePoint(1.2, -0.1) },
      { type: 'up', point: imagePoint(1.2, -0.1) },
    ]);
    expect(last(results).command).toMatchObject({ points: [{ x: 1, y: 0 }] });
  });

  it('when the pointer moves or lifts with no press, then nothing happens', () => {
    expect(run('pin', [move(5, 5), up(5, 5)])).toEqual([{ state: idle }, { state: idle }]);
  });
});

describe.each(['circle', 'arrow'] as const)('%s tool', (shape) => {
  it('when dragged, then a draft follows the pointer and release creates the mark from press to release', () => {
    const results = run(shape, [down(100, 100), move(102, 100), move(150, 180), up(160, 190)]);
    expect(results[1]?.state.phase).toBe('pointing');
    expect(results[1]?.draft).toBeUndefined();
    expect(results[2]?.state.phase).toBe('dragging');
    expect(results[2]?.draft).toEqual({ shape, points: [at(100, 100), at(150, 180)] });
    expect(last(results)).toEqual({
      state: idle,
      command: { type: 'create', shape, points: [at(100, 100), at(160, 190)] },
    });
  });

  it('when clicked without a drag of 4 stage px, then nothing is created', () => {
    expect(last(run(shape, [down(100, 100), move(102, 101), up(102, 102)])).command).toBeUndefined();
  });

  it('when Escape is pressed mid-drag, then the draft is dropped, the tool is idle and release creates nothing', () => {
    const results = run(shape, [down(100, 100), move(200, 200), escape, up(200, 200)]);
    expect(results[2]).toEqual({ state: idle });
    expect(last(results)).toEqual({ state: idle });
  });
});

describe('rect tool', () => {
  it('when dragged from bottom-right to top-left, then the rect is stored top-left first', () => {
    expect(last(run('rect', [down(300, 400), move(100, 100), up(100, 100)])).command).toEqual({
      type: 'create',
      shape: 'rect',
      points: [at(100, 100), at(300, 400)],
    });
  });

  it('when clicked in place, then nothing is created', () => {
    expect(last(run('rect', [down(300, 400), up(301, 401)])).command).toBeUndefined();
  });

  it('when the same 2 image px drag is made zoomed in 4×, then it counts as a drag because it spans 8 stage px', () => {
    const zoomedIn: ToolContext = { ...ctx, view: { scale: 4, x: 0, y: 0 } };
    expect(last(run('rect', [down(100, 100), up(102, 100)])).command).toBeUndefined();
    expect(last(run('rect', [down(100, 100), up(102, 100)], zoomedIn)).command).toMatchObject({ shape: 'rect' });
  });
});

describe('freehand tool', () => {
  it('when a stroke is drawn, then its points are collected and simplified on release', () => {
    // An L: along y = 100 to x = 300 with sub-pixel wobble, then down to y = 300.
    const along = Array.from({ length: 20 }, (_, i) => move(110 + i * 10, 100 + (i % 2) * 0.4));
    const downward = Array.from({ length: 20 }, (_, i) => move(300, 110 + i * 10));
    const results = run('freehand', [down(100, 100), ...along, ...downward, up(300, 300)]);
    expect(results[5]?.draft?.points.length).toBe(6);
    expect(last(results).command).toEqual({
      type: 'create',
      shape: 'freehand',
      points: [at(100, 100), at(300, 100.4), at(300, 300)],
    });
  });

  it('when the pointer only wobbles in place, then nothing is created', () => {
    expect(last(run('freehand', [down(100, 100), move(101, 101), up(101, 100)])).command).toBeUndefined();
  });

  it('when Escape is pressed mid-stroke, then the stroke is dropped', () => {
    const results = run('freehand', [down(0, 0), move(50, 50), move(100, 0), escape, up(100, 0)]);
    expect(results[3]).toEqual({ state: idle });
    expect(last(results).command).toBeUndefined();
  });
});

describe('select tool', () => {
  const box: MarkupItem = { id: 7, shape: 'rect', points: [at(100, 100), at(300, 300)] };
  const body: Grab = { kind: 'body', item: box };
  const corner: Grab = { kind: 'handle', item: box, handle: 'bottom-right' };

  it('when a finding is clicked, then it is selected and nothing is sent', () => {
    expect(last(run('select', [down(200, 200), up(201, 200)], ctx, body))).toEqual({ state: idle, selection: 7 });
  });

  it('when empty photo is clicked, then the selection is cleared', () => {
    expect(last(run('select', [down(800, 800), up(800, 800)]))).toEqual({ state: idle, selection: null });
  });

  it('when a finding is dragged, then a draft shows it moved and release sends a move and selects it', () => {
    const results = run('select', [down(200, 200), move(250, 220), up(250, 220)], ctx, body);
    expect(results[1]?.draft).toMatchObject({ id: 7, shape: 'rect' });
    expect(px(results[1]?.draft?.points)).toEqual([
      [150, 120],
      [350, 320],
    ]);
    const result = last(results);
    expect(result.selection).toBe(7);
    expect(result.command).toMatchObject({ type: 'move', id: 7 });
    const command = result.command?.type === 'move' ? result.command : undefined;
    expect(command?.dx).toBeCloseTo(0.05, 12);
    expect(command?.dy).toBeCloseTo(0.02, 12);
  });

  it('when a finding is dragged past the photo’s edge, then the move sent is what it could really move', () => {
    const command = last(run('select', [down(200, 200), move(-400, 200), up(-400, 200)], ctx, body)).command;
    expect(command?.type === 'move' && command.dx).toBeCloseTo(-0.1, 12);
  });

  it('when a handle of the selected finding is dragged, then release sends a resize', () => {
    const results = run('select', [down(300, 300), move(500, 600), up(500, 600)], ctx, corner);
    expect(results[1]?.draft).toEqual({ id: 7, shape: 'rect', points: [at(100, 100), at(500, 600)] });
    expect(last(results)).toEqual({
      state: idle,
      selection: 7,
      command: { type: 'resize', id: 7, handle: 'bottom-right', to: at(500, 600) },
    });
  });

  it('when Escape is pressed mid-drag, then the finding snaps back: no draft and no command', () => {
    const results = run('select', [down(200, 200), move(260, 260), escape, up(260, 260)], ctx, body);
    expect(results[2]).toEqual({ state: idle });
    expect(last(results)).toEqual({ state: idle });
  });

  it('when Escape is pressed with nothing in progress, then the selection is cleared', () => {
    expect(run('select', [escape])).toEqual([{ state: idle, selection: null }]);
  });

  it('when empty photo is dragged, then nothing is sent and the selection stays (the view pans)', () => {
    expect(last(run('select', [down(800, 800), move(700, 700), up(700, 700)]))).toEqual({ state: idle });
  });
});
