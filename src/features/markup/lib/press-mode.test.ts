import { describe, expect, it } from 'vitest';
import { imagePoint } from '../model/coordinates';
import type { Grab } from '../model/hit-test';
import { pressMode, type PressInput } from './press-mode';

const pin = { id: 5, shape: 'pin' as const, points: [imagePoint(0.5, 0.5)] };
const body: Grab = { kind: 'body', item: pin };
const base: PressInput = {
  tool: 'select',
  button: 0,
  spaceHeld: false,
  canCreate: true,
  insideImage: true,
  grab: null,
  editable: () => true,
};

describe('pressMode', () => {
  it('when the middle button or Space is used, then the press pans whatever the tool', () => {
    expect(pressMode({ ...base, tool: 'circle', button: 1 })).toEqual({ kind: 'pan' });
    expect(pressMode({ ...base, tool: 'pin', spaceHeld: true })).toEqual({ kind: 'pan' });
  });

  it('when a drawing tool presses on the photo, then the tool takes it; on the margin, or without the right, it pans', () => {
    expect(pressMode({ ...base, tool: 'rect' })).toEqual({ kind: 'tool', grab: null });
    expect(pressMode({ ...base, tool: 'rect', insideImage: false })).toEqual({ kind: 'pan' });
    expect(pressMode({ ...base, tool: 'rect', canCreate: false })).toEqual({ kind: 'pan' });
  });

  it('when Select presses on empty photo, then it pans, and a plain click clears the selection', () => {
    expect(pressMode(base)).toEqual({ kind: 'pan', click: null });
  });

  it('when Select presses on a finding the person may edit, then the select tool takes it (to move or resize)', () => {
    expect(pressMode({ ...base, grab: body })).toEqual({ kind: 'tool', grab: body });
  });

  it('when Select presses on a finding the person may not edit, then a click selects it and a drag pans', () => {
    expect(pressMode({ ...base, grab: body, editable: () => false })).toEqual({ kind: 'pan', click: 5 });
  });
});
