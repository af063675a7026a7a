import { useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import type { Photo } from '../../../../shared/schemas/photos';
import { photoWords } from '../lib/photo-words';
import { photoSources } from '../../../lib/photo-sources';

const clamp = (n: number) => Math.min(100, Math.max(0, Math.round(n)));
const keySteps: Record<string, (v: number) => number> = {
  ArrowLeft: (v) => v - 5,
  ArrowDown: (v) => v - 5,
  ArrowRight: (v) => v + 5,
  ArrowUp: (v) => v + 5,
  PageDown: (v) => v - 20,
  PageUp: (v) => v + 20,
  Home: () => 0,
  End: () => 100,
};
const tag =
  'pointer-events-none absolute top-2 rounded-full bg-bakelite/75 px-2.5 py-0.5 text-xs font-semibold text-white';

/**
 * The after photo laid over the before one and cut at the divider: before shows to its left, after to its right.
 * Drag anywhere on the picture (mouse, pen or finger; vertical swipes still scroll the page) or move the handle
 * with the arrow keys, Page Up/Down, Home and End.
 */
export function CompareSlider({ before, after, sizes }: { before: Photo; after: Photo; sizes: string }) {
  const [position, setPosition] = useState(50);
  const box = useRef<HTMLDivElement>(null);
  const handle = useRef<HTMLDivElement>(null);
  const dragging = useRef(false);

  const follow = (clientX: number) => {
    const rect = box.current?.getBoundingClientRect();
    if (rect && rect.width > 0) setPosition(clamp(((clientX - rect.left) / rect.width) * 100));
  };
  const onPointerDown = (e: PointerEvent<HTMLDivElement>) => {
    if (e.pointerType === 'mouse' && e.button !== 0) return;
    dragging.current = true;
    e.currentTarget.setPointerCapture?.(e.pointerId);
    handle.current?.focus({ preventScroll: true });
    // A finger may be starting a scroll past the picture: the divider waits for it to move sideways (a vertical
    // swipe cancels the pointer, since the picture lets the page pan up and down). A mouse jumps straight there.
    if (e.pointerType !== 'touch') follow(e.clientX);
  };
  const onPointerMove = (e: PointerEvent<HTMLDivElement>) => {
    if (dragging.current) follow(e.clientX);
  };
  const stop = () => {
    dragging.current = false;
  };
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const step = keySteps[e.key];
    if (!step) return;
    e.preventDefault();
    setPosition((v) => clamp(step(v)));
  };

  const ratio = before.width > 0 && before.height > 0 ? `${before.width} / ${before.height}` : '4 / 3';
  return (
    <div
      ref={box}
      className="relative touch-pan-y overflow-hidden rounded-xl bg-sunken select-none"
      style={{ aspectRatio: ratio }}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={stop}
      onPointerCancel={stop}
      onLostPointerCapture={stop}
    >
      <img
        loading="lazy"
        decoding="async"
        {...photoSources(before, sizes)}
        alt={`Before — ${photoWords(before)}`}
        draggable={false}
        className="absolute inset-0 h-full w-full object-cover"
      />
      <img
        loading="lazy"
        decoding="async"
        {...photoSources(after, sizes)}
        alt={`After — ${photoWords(after)}`}
        draggable={false}
        className="absolute inset-0 h-full w-full object-cover"
        style={{ clipPath: `inset(0 0 0 ${position}%)` }}
      />
      <span aria-hidden="true" className={`${tag} left-2`}>
        Before
      </span>
      <span aria-hidden="true" className={`${tag} right-2`}>
        After
      </span>
      <div
        ref={handle}
        role="slider"
        tabIndex={0}
        aria-label="Before and after comparison"
        aria-orientation="horizontal"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={position}
        aria-valuetext={`${position}% before, ${100 - position}% after`}
        onKeyDown={onKeyDown}
        className="group absolute inset-y-0 flex w-11 -translate-x-1/2 cursor-ew-resize items-center justify-center focus-visible:outline-none"
        style={{ left: `${position}%` }}
      >
        <span
          aria-hidden="true"
          className="absolute inset-y-0 left-1/2 w-0.5 -translate-x-1/2 bg-white shadow-[0_0_0_1px_rgb(0_0_0/0.35)]"
        />
        <span
          aria-hidden="true"
          className="relative flex h-11 w-11 items-center justify-center rounded-full border-2 border-white bg-bakelite/80 text-white shadow-md group-focus-visible:ring-4 group-focus-visible:ring-glow"
        >
          <svg
            viewBox="0 0 20 20"
            className="h-5 w-5"
            fill="none"
            stroke="currentColor"
            strokeWidth={2}
            strokeLinecap="round"
            strokeLinejoin="round"
          >
            <path d="m7.5 6-4 4 4 4M12.5 6l4 4-4 4" />
          </svg>
        </span>
      </div>
    </div>
  );
}
