import type { Handle } from '../model/geometry';
import type { Grab } from '../model/hit-test';
import type { Tool } from '../model/tools';

const handleCursors: Record<Handle, string> = {
  'top-left': 'nwse-resize',
  'bottom-right': 'nwse-resize',
  'top-right': 'nesw-resize',
  'bottom-left': 'nesw-resize',
  rim: 'crosshair',
  start: 'crosshair',
  end: 'crosshair',
};

/** The mouse cursor over the stage: it tells what a press would do there (see `pressMode`). */
export function cursorFor(input: {
  readonly tool: Tool;
  readonly spaceHeld: boolean;
  readonly canCreate: boolean;
  readonly insideImage: boolean;
  readonly grab: Grab | null;
  readonly canEdit: (id: number) => boolean;
}): string {
  const { tool, spaceHeld, canCreate, insideImage, grab, canEdit } = input;
  if (spaceHeld) return 'grab';
  if (tool !== 'select') return canCreate && insideImage ? 'crosshair' : 'grab';
  if (!grab) return 'grab';
  if (!canEdit(grab.item.id)) return 'pointer';
  return grab.kind === 'handle' ? handleCursors[grab.handle] : 'move';
}
