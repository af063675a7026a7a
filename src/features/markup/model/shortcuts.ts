import type { ImageSize } from './coordinates';
import type { Tool } from './tools';

/** What a key asks the markup canvas to do. A nudge is in image px. */
export type ShortcutAction =
  | { readonly type: 'tool'; readonly tool: Tool }
  | { readonly type: 'cancel' | 'delete' | 'undo' | 'zoom-in' | 'zoom-out' | 'fit' | 'actual-size' | 'place' }
  | { readonly type: 'nudge'; readonly dx: number; readonly dy: number };

/** The parts of a KeyboardEvent the map reads. */
export interface KeyLike {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey?: boolean;
}

/** Image px per arrow press, and with Shift held. */
export const NUDGE_PX = 1;
export const NUDGE_SHIFT_PX = 10;

const toolKeys: Record<string, Tool> = { v: 'select', p: 'pin', c: 'circle', r: 'rect', a: 'arrow', f: 'freehand' };
const arrows: Record<string, readonly [number, number]> = {
  ArrowLeft: [-1, 0],
  ArrowRight: [1, 0],
  ArrowUp: [0, -1],
  ArrowDown: [0, 1],
};
const plainKeys: Record<string, ShortcutAction> = {
  Escape: { type: 'cancel' },
  Enter: { type: 'place' },
  Delete: { type: 'delete' },
  Backspace: { type: 'delete' },
  // '=' is '+' without Shift on many layouts, '−' (U+2212) is what the help panel shows.
  '+': { type: 'zoom-in' },
  '=': { type: 'zoom-in' },
  '-': { type: 'zoom-out' },
  '−': { type: 'zoom-out' },
  _: { type: 'zoom-out' },
  '0': { type: 'fit' },
  '1': { type: 'actual-size' },
};

/**
 * The action for a key press, or null to let the browser have it. Ctrl or Cmd with anything but Z is left alone
 * (Ctrl+C copies, Ctrl+0 resets the page zoom). The view should not call this while focus is in a text field.
 */
export function actionForKey(event: KeyLike): ShortcutAction | null {
  if (event.altKey) return null;
  if (event.ctrlKey || event.metaKey)
    return event.key.toLowerCase() === 'z' && !event.shiftKey ? { type: 'undo' } : null;
  const tool = toolKeys[event.key.toLowerCase()];
  if (tool && event.key.length === 1) return { type: 'tool', tool };
  const arrow = arrows[event.key];
  if (arrow) {
    const step = event.shiftKey ? NUDGE_SHIFT_PX : NUDGE_PX;
    return { type: 'nudge', dx: arrow[0] * step, dy: arrow[1] * step };
  }
  return plainKeys[event.key] ?? null;
}

/** A nudge in image px as a move in normalised coordinates, ready for a move command. */
export const nudgeToNormalised = (dx: number, dy: number, image: ImageSize): { dx: number; dy: number } => ({
  dx: dx / image.width,
  dy: dy / image.height,
});

/** The help panel's list, in the order it is read. */
export const shortcutHelp: readonly { readonly keys: readonly string[]; readonly description: string }[] = [
  { keys: ['V'], description: 'Select, move and resize findings' },
  { keys: ['P'], description: 'Place a pin' },
  { keys: ['C'], description: 'Draw a circle' },
  { keys: ['R'], description: 'Draw a rectangle' },
  { keys: ['A'], description: 'Draw an arrow' },
  { keys: ['F'], description: 'Draw freehand' },
  { keys: ['Tab'], description: 'Focus the photo: a crosshair appears' },
  {
    keys: ['←', '↑', '→', '↓'],
    description: 'Move the crosshair (with Shift: further); with a finding selected, nudge it by one photo pixel',
  },
  {
    keys: ['Enter'],
    description: 'At the crosshair: place a pin, or start and then finish a shape; with Select, pick the finding there',
  },
  { keys: ['Esc'], description: 'Cancel the drawing, or clear the selection' },
  { keys: ['Delete', 'Backspace'], description: 'Delete the selected finding' },
  { keys: ['Ctrl+Z', '⌘Z'], description: 'Undo the last change' },
  { keys: ['+', '−'], description: 'Zoom in, zoom out' },
  { keys: ['0'], description: 'Fit the whole photo' },
  { keys: ['1'], description: 'Actual size (one photo pixel per screen pixel)' },
  { keys: ['Shift+arrow'], description: 'Nudge by ten photo pixels' },
];
