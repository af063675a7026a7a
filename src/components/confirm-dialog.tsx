import { useEffect, useId, useRef, type KeyboardEvent } from 'react';
import { buttonClass } from './button';

/** What a confirmation asks: the action, what follows from it in words, and the words on its button. */
export interface ConfirmRequest {
  title: string;
  consequence: string;
  confirmLabel: string;
  cancelLabel?: string;
  /** The action destroys or removes something: its button is drawn as a danger. */
  danger?: boolean;
}

const focusable =
  'button:not([disabled]), [href], input:not([disabled]), select, textarea, [tabindex]:not([tabindex="-1"])';

/**
 * A modal confirmation on the native `<dialog>` (`showModal`: the page behind is inert). Focus starts on the
 * safe answer, Tab and Shift+Tab go round inside, Escape answers no, and focus goes back where it was.
 * Shown while `request` is set; keep the same `request` object while it is open.
 */
export function ConfirmDialog({
  request,
  onAnswer,
}: {
  request: ConfirmRequest | undefined;
  onAnswer: (yes: boolean) => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const cancelRef = useRef<HTMLButtonElement>(null);
  const titleId = useId();
  const textId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog || !request) return;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    if (!dialog.open) dialog.showModal();
    cancelRef.current?.focus();
    return () => {
      if (dialog.open) dialog.close();
      if (opener?.isConnected) opener.focus();
    };
  }, [request]);

  if (!request) return null;

  const keepFocusInside = (e: KeyboardEvent<HTMLDialogElement>) => {
    // Keys pressed in the dialog are its own: the shortcuts of the page around it do not see them.
    e.stopPropagation();
    if (e.key === 'Escape') {
      e.preventDefault();
      onAnswer(false);
      return;
    }
    if (e.key !== 'Tab') return;
    const items = [...e.currentTarget.querySelectorAll<HTMLElement>(focusable)];
    const first = items[0];
    const last = items.at(-1);
    if (!first || !last) return;
    const at = document.activeElement;
    if (e.shiftKey && (at === first || !e.currentTarget.contains(at))) {
      e.preventDefault();
      last.focus();
    } else if (!e.shiftKey && (at === last || !e.currentTarget.contains(at))) {
      e.preventDefault();
      first.focus();
    }
  };

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={textId}
      onKeyDown={keepFocusInside}
      onCancel={(e) => {
        e.preventDefault();
        onAnswer(false);
      }}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-xl border border-rule bg-panel p-5 text-ink shadow-xl backdrop:bg-black/50"
    >
      <h2 id={titleId} className="text-lg font-bold">
        {request.title}
      </h2>
      <p id={textId} className="mt-2 text-ink-soft">
        {request.consequence}
      </p>
      <div className="mt-5 flex flex-wrap justify-end gap-2">
        <button ref={cancelRef} type="button" className={buttonClass('quiet')} onClick={() => onAnswer(false)}>
          {request.cancelLabel ?? 'Cancel'}
        </button>
        <button
          type="button"
          className={buttonClass(request.danger ? 'danger' : 'primary')}
          onClick={() => onAnswer(true)}
        >
          {request.confirmLabel}
        </button>
      </div>
    </dialog>
  );
}
