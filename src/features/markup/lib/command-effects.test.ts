import { describe, expect, it } from 'vitest';
import { imagePoint } from '../model/coordinates';
import { emptyHistory, push, undo } from '../model/history';
import { changeOf, effectOf } from './command-effects';

const pin = { id: 1, shape: 'pin' as const, points: [imagePoint(0.98, 0.5)] };
const circle = { id: 2, shape: 'circle' as const, points: [imagePoint(0.5, 0.5), imagePoint(0.6, 0.5)] };
const marks = [pin, circle];

describe('effectOf', () => {
  it('when a finding is moved or resized, then the canvas sends its new points', () => {
    expect(effectOf({ type: 'move', id: 2, dx: 0.1, dy: 0 }, marks)).toEqual({
      kind: 'points',
      id: 2,
      points: [imagePoint(0.6, 0.5), imagePoint(0.7, 0.5)],
    });
    expect(effectOf({ type: 'resize', id: 2, handle: 'rim', to: imagePoint(0.5, 0.7) }, marks)).toEqual({
      kind: 'points',
      id: 2,
      points: [imagePoint(0.5, 0.5), imagePoint(0.5, 0.7)],
    });
  });

  it('when a command names a finding that is gone, then nothing is sent', () => {
    expect(effectOf({ type: 'delete', id: 99 }, marks)).toEqual({ kind: 'none' });
  });

  it('when a create carries fields, or an edit carries no points, then it is left to the page', () => {
    const create = {
      type: 'create' as const,
      shape: 'pin' as const,
      points: [imagePoint(0.1, 0.1)],
      fields: { title: 'R5 charred' },
    };
    expect(effectOf(create, marks)).toEqual({ kind: 'create', command: create });
    expect(effectOf({ type: 'edit', id: 1, fields: { title: 'x' } }, marks).kind).toBe('fields');
  });
});

describe('changeOf then undo', () => {
  it('when a move stops at the photo edge, then undo moves the mark back exactly as far as it went', () => {
    const change = changeOf({ type: 'move', id: 1, dx: 0.1, dy: 0 }, marks);
    expect(change).toMatchObject({ type: 'moved', id: 1 });
    if (change?.type !== 'moved') throw new Error('a move expected');
    expect(change.dx).toBeCloseTo(0.02, 12);
    const moved = [{ ...pin, points: [imagePoint(1, 0.5)] }];
    const step = undo(push(emptyHistory(), change));
    if (!step) throw new Error('an undo step expected');
    const effect = effectOf(step.command, moved);
    if (effect.kind !== 'points') throw new Error('points expected');
    expect(effect.points[0]?.x).toBeCloseTo(0.98, 12);
  });

  it('when a resize is undone, then the points it replaced are sent back', () => {
    const change = changeOf({ type: 'resize', id: 2, handle: 'rim', to: imagePoint(0.9, 0.5) }, marks);
    const step = change && undo(push(emptyHistory(), change));
    expect(step && effectOf(step.command, marks)).toEqual({ kind: 'points', id: 2, points: circle.points });
  });

  it('when a move goes nowhere, then nothing is recorded', () => {
    expect(
      changeOf({ type: 'move', id: 1, dx: 0.5, dy: 0 }, [{ ...pin, points: [imagePoint(1, 0.5)] }]),
    ).toBeUndefined();
  });
});
