import { describe, expect, it } from 'vitest';
import { imagePoint } from '../model/coordinates';
import { cursorFor } from './cursor';

const rect = { id: 1, shape: 'rect' as const, points: [imagePoint(0.1, 0.1), imagePoint(0.3, 0.3)] };
const base = {
  tool: 'select' as const,
  spaceHeld: false,
  canCreate: true,
  insideImage: true,
  grab: null,
  canEdit: () => true,
};

describe('cursorFor', () => {
  it('when over what a press would act on, then the cursor says so', () => {
    expect(cursorFor(base)).toBe('grab');
    expect(cursorFor({ ...base, grab: { kind: 'body', item: rect } })).toBe('move');
    expect(cursorFor({ ...base, grab: { kind: 'handle', item: rect, handle: 'top-right' } })).toBe('nesw-resize');
    expect(cursorFor({ ...base, grab: { kind: 'body', item: rect }, canEdit: () => false })).toBe('pointer');
    expect(cursorFor({ ...base, tool: 'pin' })).toBe('crosshair');
    expect(cursorFor({ ...base, tool: 'pin', insideImage: false })).toBe('grab');
    expect(cursorFor({ ...base, tool: 'pin', spaceHeld: true })).toBe('grab');
  });
});
