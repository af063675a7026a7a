import { useEffect, useId, useRef, type ReactNode } from 'react';
import { controlClass, floatingPanelClass } from '../lib/control-styles';

/**
 * A non-modal panel over the stage with a heading and a Close button, which takes focus when it opens. Escape
 * (or the key that opened it) closes it without reaching the canvas.
 */
export function FloatingPanel({
  title,
  closeKeys = [],
  onClose,
  children,
}: {
  title: string;
  closeKeys?: string[];
  onClose: () => void;
  children: ReactNode;
}) {
  const headingId = useId();
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => close.current?.focus(), []);
  return (
    <section
      role="dialog"
      aria-labelledby={headingId}
      className={floatingPanelClass}
      onKeyDown={(e) => {
        if (e.key !== 'Escape' && !closeKeys.includes(e.key)) return;
        e.preventDefault();
        e.stopPropagation();
        onClose();
      }}
    >
      <div className="mb-2 flex items-center justify-between gap-2">
        <h2 id={headingId} className="text-lg font-bold">
          {title}
        </h2>
        <button ref={close} type="button" onClick={onClose} className={controlClass}>
          Close
        </button>
      </div>
      {children}
    </section>
  );
}
