import { describe, expect, it } from 'vitest';
import { tools } from '../model/tools';
import { toolShortcut } from './tool-labels';

describe('toolShortcut', () => {
  it('when the toolbar labels its buttons, then each tool shows the letter the key map gives it', () => {
    expect(tools.map(toolShortcut)).toEqual(['V', 'P', 'C', 'R', 'A', 'F']);
  });
});
