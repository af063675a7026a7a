import { describe, expect, it } from 'vitest';
import { imagePoint as p } from './coordinates';
import { canUndo, emptyHistory, HISTORY_LIMIT, inverseOf, push, remapId, undo, type UndoHistory } from './history';

describe('inverseOf', () => {
  it('when a finding was created, then undoing deletes it', () => {
    expect(inverseOf({ type: 'created', id: 4 })).toEqual({ type: 'delete', id: 4 });
  });

  it('when a finding was deleted, then undoing creates it again with its mark and fields', () => {
    const fields = {
      title: 'Leaking can',
      componentRef: 'C15b',
      kind: 'leaking',
      severity: 'fault',
      status: 'confirmed',
    } as const;
    expect(inverseOf({ type: 'deleted', shape: 'circle', points: [p(0.5, 0.5), p(0.6, 0.5)], fields })).toEqual({
      type: 'create',
      shape: 'circle',
      points: [p(0.5, 0.5), p(0.6, 0.5)],
      fields,
    });
  });

  it('when a finding was moved, then undoing moves it back by the same delta', () => {
    expect(inverseOf({ type: 'moved', id: 4, dx: 0.1, dy: -0.25 })).toEqual({
      type: 'move',
      id: 4,
      dx: -0.1,
      dy: 0.25,
    });
  });

  it('when a finding was resized, then undoing puts its previous points back', () => {
    expect(inverseOf({ type: 'resized', id: 4, before: [p(0.1, 0.1), p(0.2, 0.2)] })).toEqual({
      type: 'edit',
      id: 4,
      points: [p(0.1, 0.1), p(0.2, 0.2)],
    });
  });

  it('when fields were edited, then undoing restores their previous values', () => {
    expect(inverseOf({ type: 'edited', id: 4, before: { status: 'suspected', dismissReason: null } })).toEqual({
      type: 'edit',
      id: 4,
      fields: { status: 'suspected', dismissReason: null },
    });
  });
});

describe('undo history', () => {
  it('when changes are pushed, then undo hands back their inverses newest first, then null', () => {
    let history = push(push(emptyHistory(), { type: 'created', id: 1 }), { type: 'moved', id: 1, dx: 0.1, dy: 0 });
    const first = undo(history);
    expect(first?.command).toEqual({ type: 'move', id: 1, dx: -0.1, dy: -0 });
    history = first?.history ?? history;
    const second = undo(history);
    expect(second?.command).toEqual({ type: 'delete', id: 1 });
    expect(canUndo(second?.history ?? history)).toBe(false);
    expect(undo(second?.history ?? history)).toBeNull();
  });

  it('when more than 50 changes are pushed, then only the newest 50 can be undone', () => {
    let history: UndoHistory = emptyHistory();
    for (let id = 1; id <= 60; id++) history = push(history, { type: 'created', id });
    expect(history.inverses).toHaveLength(HISTORY_LIMIT);
    expect(history.inverses[0]).toEqual({ type: 'delete', id: 11 });
    expect(history.inverses[49]).toEqual({ type: 'delete', id: 60 });
  });

  it('when a history is pushed to, then the earlier value is left as it was', () => {
    const before = emptyHistory();
    push(before, { type: 'created', id: 1 });
    expect(before.inverses).toEqual([]);
  });

  it('when an undone delete comes back under a new id, then older entries follow the new id', () => {
    let history = push(emptyHistory(), { type: 'moved', id: 5, dx: 0.1, dy: 0.1 });
    history = push(history, { type: 'edited', id: 5, before: { title: 'Old' } });
    history = push(history, { type: 'created', id: 6 });
    expect(remapId(history, 5, 9).inverses).toEqual([
      { type: 'move', id: 9, dx: -0.1, dy: -0.1 },
      { type: 'edit', id: 9, fields: { title: 'Old' } },
      { type: 'delete', id: 6 },
    ]);
  });
});
