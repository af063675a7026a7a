import { useEffect, useRef, type KeyboardEvent as ReactKeyboardEvent, type RefObject } from 'react';
import { actionForKey, nudgeToNormalised } from '../model/shortcuts';
import type { ImageSize } from '../model/coordinates';
import type { Command } from '../model/commands';
import type { Tool } from '../model/tools';
import { ZOOM_STEP } from '../lib/zoom';
import type { CrosshairControls } from './use-crosshair';
import type { ViewControls } from './use-view';

/** Stage px the view moves per arrow press when no finding is selected (and with Shift). */
const PAN_STEP_PX = 50;
const PAN_SHIFT_STEP_PX = 200;

export interface KeyEnv {
  readonly tool: Tool;
  readonly canCreate: boolean;
  readonly selectedId: number | undefined;
  readonly canEditSelected: boolean;
  readonly image: ImageSize;
  readonly view: ViewControls;
  /** The stage element: Space held there pans. */
  readonly stage: RefObject<HTMLElement | null>;
  setTool(tool: Tool): void;
  /** Drop a gesture in progress; true when there was one. */
  cancelGesture(): boolean;
  toggleHelp(): void;
  setSpaceHeld(held: boolean): void;
  onSelect(id: number | undefined): void;
  run(command: Command): void;
  /** Ask, then delete; resolves true once deleted. */
  remove(id: number): Promise<boolean>;
  undo(): void;
  /** The keyboard crosshair: arrows move it when no editable finding is selected, Enter acts at it. */
  readonly crosshair: Pick<CrosshairControls, 'shown' | 'show' | 'move' | 'enter'>;
}

const typing = (target: EventTarget) =>
  target instanceof HTMLElement && target.matches('input, textarea, select, [contenteditable="true"]');

/**
 * The canvas's keys (`model/shortcuts.ts`), handled on the canvas's own element so they only act while focus is
 * in it (never while typing in the finding panel), plus "?" for the help and Space held to pan.
 */
export function useMarkupKeys(env: KeyEnv) {
  const latest = useRef(env);
  useEffect(() => {
    latest.current = env;
  });

  const onKeyDown = (e: ReactKeyboardEvent) => {
    const k = latest.current;
    if (e.defaultPrevented || typing(e.target)) return;
    if (e.key === '?') {
      e.preventDefault();
      k.toggleHelp();
      return;
    }
    if (e.key === ' ' && e.target === k.stage.current) {
      e.preventDefault();
      k.setSpaceHeld(true);
      return;
    }
    const action = actionForKey(e);
    const onStage = e.target === k.stage.current;
    // In the toolbar the arrow keys move between its buttons; Enter elsewhere presses what has focus.
    if (!action || (action.type === 'nudge' && e.target instanceof Element && e.target.closest('[role="toolbar"]')))
      return;
    if (action.type === 'place' && !onStage) return;
    e.preventDefault();
    const id = k.selectedId;
    switch (action.type) {
      case 'tool':
        if (action.tool !== 'select' && !k.canCreate) return;
        k.cancelGesture();
        k.setTool(action.tool);
        return;
      case 'cancel':
        if (!k.cancelGesture() && id !== undefined) k.onSelect(undefined);
        return;
      case 'delete':
        if (id !== undefined && k.canEditSelected) void k.remove(id);
        return;
      case 'undo':
        k.undo();
        return;
      case 'zoom-in':
      case 'zoom-out':
        k.view.zoomBy(action.type === 'zoom-in' ? ZOOM_STEP : 1 / ZOOM_STEP);
        return;
      case 'fit':
        k.view.fit();
        return;
      case 'actual-size':
        k.view.actualSize();
        return;
      case 'place':
        if (k.tool !== 'select' && !k.canCreate) return;
        k.crosshair.enter();
        return;
      case 'nudge':
        if (id !== undefined && k.canEditSelected) {
          k.run({ type: 'move', id, ...nudgeToNormalised(action.dx, action.dy, k.image) });
        } else if (onStage && (k.crosshair.shown || k.tool !== 'select')) {
          k.crosshair.move(action.dx, action.dy, e.shiftKey);
        } else {
          const step = e.shiftKey ? PAN_SHIFT_STEP_PX : PAN_STEP_PX;
          k.view.panBy(-Math.sign(action.dx) * step, -Math.sign(action.dy) * step);
        }
        return;
    }
  };

  const onKeyUp = (e: ReactKeyboardEvent) => {
    if (e.key === ' ') latest.current.setSpaceHeld(false);
  };

  return { onKeyDown, onKeyUp };
}
