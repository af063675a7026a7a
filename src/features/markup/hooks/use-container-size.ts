import { useLayoutEffect, useRef, useState } from 'react';
import type { StageSize } from '../model/coordinates';

const sameSize = (a: StageSize | undefined, b: StageSize) => a?.width === b.width && a.height === b.height;

/**
 * The size of an element in whole CSS px, kept current with a ResizeObserver (rotating a phone, resizing a
 * window, the side panel opening). Undefined until measured, or while the element has no area.
 */
export function useContainerSize<T extends HTMLElement>() {
  const ref = useRef<T>(null);
  const [size, setSize] = useState<StageSize>();
  useLayoutEffect(() => {
    const node = ref.current;
    if (!node) return;
    const measure = (width: number, height: number) => {
      const next = { width: Math.floor(width), height: Math.floor(height) };
      setSize((prev) => (next.width <= 0 || next.height <= 0 ? undefined : sameSize(prev, next) ? prev : next));
    };
    const rect = node.getBoundingClientRect();
    measure(rect.width, rect.height);
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver((entries) => {
      const box = entries[0]?.contentRect;
      if (box) measure(box.width, box.height);
    });
    observer.observe(node);
    return () => observer.disconnect();
  }, []);
  return { ref, size };
}
