import { useCallback, useEffect, useRef, useState } from 'react';
import type { Mark } from '../lib/marks';
import type { Command } from '../model/commands';
import type { ImageSize, StageSize } from '../model/coordinates';
import {
  crosshairDraft,
  crosshairEnter,
  describeCrosshair,
  followCrosshair,
  moveCrosshair,
  startCrosshair,
  type CrosshairState,
} from '../model/crosshair';
import type { Tool } from '../model/tools';
import type { ViewControls } from './use-view';

export interface CrosshairEnv {
  readonly tool: Tool;
  readonly image: ImageSize;
  readonly stage: StageSize | undefined;
  readonly view: ViewControls;
  readonly marks: readonly Mark[];
  run(command: Command): void;
  onSelect(id: number | undefined): void;
}

export interface CrosshairControls {
  /** Shown while the stage has keyboard focus (Tab, or a key pressed there); a pointer press hides it. */
  readonly shown: boolean;
  readonly state: CrosshairState | undefined;
  /** What the live region says. */
  readonly description: string;
  readonly draft: ReturnType<typeof crosshairDraft>;
  show(): void;
  hide(): void;
  move(dx: number, dy: number, big: boolean): void;
  enter(): void;
  /** Drop a shape begun with Enter; true when there was one. */
  cancel(): boolean;
  /** Whether the last mark was made with Enter (so focus goes back to the photo once it is saved). */
  placedByKeyboard(): boolean;
  /** For the stage element: focus that no pointer brought shows the crosshair; a pointer press hides it. */
  readonly stageHandlers: { onFocus(): void; onPointerDownCapture(): void };
}

/**
 * The keyboard crosshair's state (`model/crosshair.ts`): where it is, where a shape began, what screen readers
 * hear. Moving it off the visible part of the photo pans the view after it.
 */
export function useCrosshair(env: CrosshairEnv): CrosshairControls {
  const latest = useRef(env);
  useEffect(() => {
    latest.current = env;
  });
  const [shown, setShown] = useState(false);
  const [state, setState] = useState<CrosshairState>();
  const [description, setDescription] = useState('');
  const stateRef = useRef<CrosshairState | undefined>(undefined);
  const pointerFocus = useRef(false);
  const byKeyboard = useRef(false);

  const commit = useCallback((next: CrosshairState | undefined) => {
    stateRef.current = next;
    setState(next);
    const e = latest.current;
    const view = e.view.latest();
    if (next && view) setDescription(describeCrosshair(e.tool, next, { view, image: e.image }, e.marks));
  }, []);

  const current = useCallback((): CrosshairState | undefined => {
    if (stateRef.current) return stateRef.current;
    const e = latest.current;
    const view = e.view.latest();
    return view && e.stage ? startCrosshair(view, e.image, e.stage) : undefined;
  }, []);

  // A new tool starts afresh: a half-made box is not carried over to an arrow.
  useEffect(() => {
    if (stateRef.current?.anchor) commit({ at: stateRef.current.at });
  }, [env.tool, commit]);

  const show = useCallback(() => {
    setShown(true);
    commit(current());
  }, [commit, current]);

  return {
    shown,
    state,
    description: shown ? description : '',
    draft: shown && state ? crosshairDraft(env.tool, state) : undefined,
    show,
    hide: useCallback(() => setShown(false), []),
    move: (dx, dy, big) => {
      const e = latest.current;
      const view = e.view.latest();
      const from = current();
      if (!view || !from || !e.stage) return;
      setShown(true);
      const next = moveCrosshair(from, dx, dy, big, { view, image: e.image });
      const pan = followCrosshair(next.at, { view, image: e.image }, e.stage);
      if (pan.dx !== 0 || pan.dy !== 0) e.view.panBy(pan.dx, pan.dy);
      commit(next);
    },
    enter: () => {
      const e = latest.current;
      const view = e.view.latest();
      const from = current();
      if (!view || !from) return;
      setShown(true);
      byKeyboard.current = true;
      const result = crosshairEnter(e.tool, from, { view, image: e.image }, e.marks);
      commit(result.state);
      if (result.kind === 'create') e.run(result.command);
      else if (result.kind === 'select') e.onSelect(result.id ?? undefined);
      else if (result.kind === 'too-small')
        setDescription('Too small to see: move the crosshair further from where it started, then press Enter.');
    },
    cancel: () => {
      const at = stateRef.current;
      if (!at?.anchor) return false;
      commit({ at: at.at });
      return true;
    },
    placedByKeyboard: () => byKeyboard.current,
    stageHandlers: {
      onFocus: () => {
        if (!pointerFocus.current) show();
        pointerFocus.current = false;
      },
      onPointerDownCapture: () => {
        pointerFocus.current = true;
        byKeyboard.current = false;
        setShown(false);
      },
    },
  };
}
