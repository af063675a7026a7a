import { actionForKey } from '../model/shortcuts';
import type { Tool } from '../model/tools';

export const toolLabels: Record<Tool, string> = {
  select: 'Select',
  pin: 'Pin',
  circle: 'Circle',
  rect: 'Rectangle',
  arrow: 'Arrow',
  freehand: 'Freehand',
};

/** The letter that picks a tool, read from the key map itself so the toolbar can never disagree with it. */
export function toolShortcut(tool: Tool): string | undefined {
  const letter = [...'abcdefghijklmnopqrstuvwxyz'].find((key) => {
    const action = actionForKey({ key, ctrlKey: false, metaKey: false, shiftKey: false });
    return action?.type === 'tool' && action.tool === tool;
  });
  return letter?.toUpperCase();
}
