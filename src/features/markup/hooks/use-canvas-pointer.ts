import { useCallback, useEffect, useRef, type PointerEvent as ReactPointerEvent, type RefObject } from 'react';
import { stagePoint, stageToImage, type ImageSize, type StagePoint, type TouchPair } from '../model/coordinates';
import { grabAt, type Grab } from '../model/hit-test';
import {
  DRAG_THRESHOLD_PX,
  idle,
  transition,
  type Draft,
  type Tool,
  type ToolEvent,
  type ToolResult,
  type ToolState,
} from '../model/tools';
import type { Mark } from '../lib/marks';
import { pressMode } from '../lib/press-mode';
import { wheelZoomFactor } from '../lib/zoom';
import { cursorFor } from '../lib/cursor';
import type { ViewControls } from './use-view';

/** What the pointer handlers read at the moment an event arrives. */
export interface PointerEnv {
  readonly image: ImageSize;
  readonly tool: Tool;
  readonly marks: readonly Mark[];
  readonly selectedId: number | undefined;
  readonly canCreate: boolean;
  readonly canEdit: (id: number) => boolean;
  readonly spaceHeld: boolean;
  readonly view: ViewControls;
  onDraft(draft: Draft | undefined): void;
  /** A finished step of the tool machine: its command and selection, if any. */
  onResult(result: ToolResult): void;
  /** A click that panned nowhere: select that finding, or clear the selection (null). */
  onClick(id: number | null): void;
}

type Press =
  | { readonly kind: 'tool' }
  | { kind: 'pan'; readonly click?: number | null; readonly start: StagePoint; last: StagePoint; moved: boolean }
  | { kind: 'pinch'; pair: TouchPair }
  /** One finger lifted after a pinch: nothing happens until the last one is up. */
  | { readonly kind: 'settle' };

const insideImage = (p: { x: number; y: number }) => p.x >= 0 && p.x <= 1 && p.y >= 0 && p.y <= 1;

/**
 * Pointer input on the stage container (mouse, pen and touch alike, through pointer events): the tool machines,
 * panning, two-finger pinch, wheel zoom and the hover cursor. Hit-testing is the model's (`grabAt`), not Konva's,
 * so the findings layer need not listen.
 */
export function useCanvasPointer(ref: RefObject<HTMLElement | null>, env: PointerEnv) {
  const latest = useRef(env);
  useEffect(() => {
    latest.current = env;
  });
  const pointers = useRef(new Map<number, StagePoint>());
  const press = useRef<Press | null>(null);
  const machine = useRef<ToolState>(idle);
  const hoverFrame = useRef(0);

  const toStage = (e: { clientX: number; clientY: number }): StagePoint => {
    const rect = ref.current?.getBoundingClientRect();
    return stagePoint(e.clientX - (rect?.left ?? 0), e.clientY - (rect?.top ?? 0));
  };
  const setCursor = (cursor: string) => {
    if (ref.current) ref.current.style.cursor = cursor;
  };

  const step = useCallback((event: ToolEvent, grab: Grab | null = null) => {
    const e = latest.current;
    const view = e.view.latest();
    if (!view) return;
    const result = transition(e.tool, machine.current, event, { view, image: e.image, grab });
    machine.current = result.state;
    e.onDraft(result.draft);
    e.onResult(result);
  }, []);

  /** Drop a gesture in progress (Escape, a tool change, a second finger). True when there was one. */
  const cancel = useCallback((): boolean => {
    const busy = machine.current.phase !== 'idle';
    if (busy) step({ type: 'escape' });
    if (press.current?.kind === 'tool') press.current = null;
    return busy;
  }, [step]);

  const pair = (): TouchPair | null => {
    const [a, b] = [...pointers.current.values()];
    return a && b ? [a, b] : null;
  };

  const hover = (at: StagePoint) => {
    cancelAnimationFrame(hoverFrame.current);
    hoverFrame.current = requestAnimationFrame(() => {
      const e = latest.current;
      const view = e.view.latest();
      if (!view) return;
      const grab =
        e.tool === 'select' && !e.spaceHeld ? grabAt(e.marks, e.selectedId ?? null, at, view, e.image) : null;
      setCursor(cursorFor({ ...e, grab, insideImage: insideImage(stageToImage(at, view, e.image)) }));
    });
  };

  const onPointerDown = (ev: ReactPointerEvent<HTMLElement>) => {
    if (ev.pointerType === 'mouse' && ev.button !== 0 && ev.button !== 1) return;
    if (ev.button === 1) ev.preventDefault(); // no auto-scroll or paste from the middle button
    ev.currentTarget.focus({ preventScroll: true });
    ev.currentTarget.setPointerCapture?.(ev.pointerId);
    const at = toStage(ev);
    pointers.current.set(ev.pointerId, at);
    const two = pair();
    if (pointers.current.size === 2 && two) {
      cancel();
      press.current = { kind: 'pinch', pair: two };
      return;
    }
    if (press.current || pointers.current.size > 1) return;
    const e = latest.current;
    const view = e.view.latest();
    if (!view) return;
    const point = stageToImage(at, view, e.image);
    const grab = e.tool === 'select' ? grabAt(e.marks, e.selectedId ?? null, at, view, e.image) : null;
    const mode = pressMode({ ...e, button: ev.button, insideImage: insideImage(point), grab, editable: e.canEdit });
    if (mode.kind === 'tool') {
      press.current = { kind: 'tool' };
      step({ type: 'down', point }, mode.grab);
    } else {
      press.current = { kind: 'pan', click: mode.click, start: at, last: at, moved: false };
    }
  };

  const onPointerMove = (ev: ReactPointerEvent<HTMLElement>) => {
    const at = toStage(ev);
    const current = press.current;
    if (!pointers.current.has(ev.pointerId) || !current) {
      if (ev.pointerType === 'mouse' && !current) hover(at);
      return;
    }
    pointers.current.set(ev.pointerId, at);
    const e = latest.current;
    if (current.kind === 'pinch') {
      const next = pair();
      if (next) e.view.pinch(current.pair, next);
      if (next) current.pair = next;
    } else if (current.kind === 'pan') {
      if (!current.moved && Math.hypot(at.x - current.start.x, at.y - current.start.y) >= DRAG_THRESHOLD_PX)
        current.moved = true;
      if (current.moved) {
        e.view.panBy(at.x - current.last.x, at.y - current.last.y);
        current.last = at;
        setCursor('grabbing');
      }
    } else if (current.kind === 'tool') {
      const view = e.view.latest();
      if (view) step({ type: 'move', point: stageToImage(at, view, e.image) });
    }
  };

  const finish = (ev: ReactPointerEvent<HTMLElement>, cancelled: boolean) => {
    if (!pointers.current.delete(ev.pointerId)) return;
    const current = press.current;
    if (current?.kind === 'pinch' || current?.kind === 'settle') {
      press.current = pointers.current.size === 0 ? null : { kind: 'settle' };
      return;
    }
    press.current = null;
    const e = latest.current;
    if (current?.kind === 'pan') {
      if (!current.moved && current.click !== undefined && !cancelled) e.onClick(current.click);
      hover(toStage(ev));
    } else if (current?.kind === 'tool') {
      const view = e.view.latest();
      if (cancelled || !view) step({ type: 'escape' });
      else step({ type: 'up', point: stageToImage(toStage(ev), view, e.image) });
    }
  };

  useEffect(() => {
    const node = ref.current;
    if (!node) return;
    // React attaches wheel listeners as passive; zooming needs preventDefault, so this one is added by hand.
    const onWheel = (ev: WheelEvent) => {
      ev.preventDefault();
      const rect = node.getBoundingClientRect();
      latest.current.view.zoomBy(
        wheelZoomFactor(ev.deltaY, ev.deltaMode, ev.ctrlKey),
        stagePoint(ev.clientX - rect.left, ev.clientY - rect.top),
      );
    };
    node.addEventListener('wheel', onWheel, { passive: false });
    return () => {
      node.removeEventListener('wheel', onWheel);
      cancelAnimationFrame(hoverFrame.current);
    };
  }, [ref]);

  return {
    cancel,
    handlers: {
      onPointerDown,
      onPointerMove,
      onPointerUp: (ev: ReactPointerEvent<HTMLElement>) => finish(ev, false),
      onPointerCancel: (ev: ReactPointerEvent<HTMLElement>) => finish(ev, true),
    },
  };
}
