import { useRef, type PointerEvent } from 'react';

/** Horizontal swipe on touch screens: left for the next photo, right for the previous one. */
export function useSwipe(onSwipe: (direction: 1 | -1) => void, minDistance = 50) {
  const start = useRef<{ x: number; y: number } | null>(null);
  return {
    onPointerDown: (e: PointerEvent) => {
      start.current = e.pointerType === 'mouse' ? null : { x: e.clientX, y: e.clientY };
    },
    onPointerUp: (e: PointerEvent) => {
      const from = start.current;
      start.current = null;
      if (!from) return;
      const dx = e.clientX - from.x;
      if (Math.abs(dx) >= minDistance && Math.abs(dx) > 2 * Math.abs(e.clientY - from.y)) onSwipe(dx < 0 ? 1 : -1);
    },
    onPointerCancel: () => {
      start.current = null;
    },
  };
}
