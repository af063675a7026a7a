import type { Grab } from '../model/hit-test';
import type { Tool } from '../model/tools';

/**
 * What a pointer-down starts. `tool`: the current tool's state machine takes the gesture (drawing, or moving and
 * resizing a finding the person may edit). `pan`: dragging moves the view; a press released without dragging
 * selects `click` (a number), clears the selection (`null`), or does nothing (`undefined`).
 */
export type PressMode =
  { readonly kind: 'tool'; readonly grab: Grab | null } | { readonly kind: 'pan'; readonly click?: number | null };

export interface PressInput {
  readonly tool: Tool;
  /** PointerEvent.button: 0 main (or touch, or pen), 1 middle. */
  readonly button: number;
  readonly spaceHeld: boolean;
  readonly canCreate: boolean;
  /** Whether the press landed on the photo itself rather than the margin around it. */
  readonly insideImage: boolean;
  /** What lies under the pointer (see `grabAt`). */
  readonly grab: Grab | null;
  readonly editable: (id: number) => boolean;
}

export function pressMode({ tool, button, spaceHeld, canCreate, insideImage, grab, editable }: PressInput): PressMode {
  // The middle button, or Space held, always pans: the way to move around mid-drawing.
  if (button === 1 || spaceHeld) return { kind: 'pan' };
  if (tool !== 'select') return canCreate && insideImage ? { kind: 'tool', grab: null } : { kind: 'pan' };
  if (!grab) return { kind: 'pan', click: null };
  return editable(grab.item.id) ? { kind: 'tool', grab } : { kind: 'pan', click: grab.item.id };
}
