import { describe, expect, it } from 'vitest';
import { actionForKey, nudgeToNormalised, shortcutHelp, type KeyLike } from './shortcuts';

const key = (k: string, mods: Partial<KeyLike> = {}): KeyLike => ({
  key: k,
  ctrlKey: false,
  metaKey: false,
  shiftKey: false,
  ...mods,
});

describe('actionForKey', () => {
  it.each([
    ['v', 'select'],
    ['P', 'pin'],
    ['c', 'circle'],
    ['r', 'rect'],
    ['a', 'arrow'],
    ['f', 'freehand'],
  ] as const)('when %s is pressed, then the %s tool is chosen', (k, tool) => {
    expect(actionForKey(key(k))).toEqual({ type: 'tool', tool });
  });

  it.each([
    ['Escape', 'cancel'],
    ['Delete', 'delete'],
    ['Backspace', 'delete'],
    ['+', 'zoom-in'],
    ['=', 'zoom-in'],
    ['-', 'zoom-out'],
    ['0', 'fit'],
    ['1', 'actual-size'],
  ] as const)('when %s is pressed, then the action is %s', (k, type) => {
    expect(actionForKey(key(k))).toEqual({ type });
  });

  it('when Ctrl+Z or Cmd+Z is pressed, then the last change is undone', () => {
    expect(actionForKey(key('z', { ctrlKey: true }))).toEqual({ type: 'undo' });
    expect(actionForKey(key('Z', { metaKey: true }))).toEqual({ type: 'undo' });
  });

  it('when Ctrl+C, Ctrl+0, Ctrl+Shift+Z or Alt+R is pressed, then the browser keeps the key', () => {
    expect(actionForKey(key('c', { ctrlKey: true }))).toBeNull();
    expect(actionForKey(key('0', { ctrlKey: true }))).toBeNull();
    expect(actionForKey(key('z', { ctrlKey: true, shiftKey: true }))).toBeNull();
    expect(actionForKey(key('r', { altKey: true }))).toBeNull();
  });

  it('when an arrow is pressed, then the selection is nudged 1 image px, or 10 with Shift', () => {
    expect(actionForKey(key('ArrowLeft'))).toEqual({ type: 'nudge', dx: -1, dy: 0 });
    expect(actionForKey(key('ArrowDown', { shiftKey: true }))).toEqual({ type: 'nudge', dx: 0, dy: 10 });
  });

  it('when a key with no shortcut is pressed, then there is no action', () => {
    expect(actionForKey(key('q'))).toBeNull();
    expect(actionForKey(key('F5'))).toBeNull();
  });
});

describe('nudgeToNormalised', () => {
  it('when a 10 image px nudge is applied to a 4000×2000 photo, then it is 0.0025 across or 0.005 down', () => {
    expect(nudgeToNormalised(10, 10, { width: 4000, height: 2000 })).toEqual({ dx: 0.0025, dy: 0.005 });
  });
});

describe('shortcutHelp', () => {
  it('when the help panel lists the shortcuts, then every tool key and every action is described', () => {
    const keys = shortcutHelp.flatMap((s) => s.keys);
    for (const k of [
      'V',
      'P',
      'C',
      'R',
      'A',
      'F',
      'Esc',
      'Delete',
      'Backspace',
      'Ctrl+Z',
      '⌘Z',
      '+',
      '−',
      '0',
      '1',
      '←',
      'Shift+arrow',
    ])
      expect(keys).toContain(k);
    expect(shortcutHelp.every((s) => s.description.length > 0)).toBe(true);
  });
});
