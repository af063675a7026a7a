import { useEffect, useId, useRef, useState } from 'react';
import { useNavigate } from 'react-router';
import { notificationPath, type Notification } from '../../../../shared/schemas/notifications';
import { useMarkNotificationsRead, useNotifications } from '../api/get-notifications';
import { fullTime, relativeTime } from './finding-format';

const kindGlyph: Record<Notification['kind'], string> = {
  mention: '@',
  question: '?',
  reply: '↩',
  'help-request': '?',
  'reading-requested': '⌁',
  'reading-answered': '✓',
  payment: '£',
};

/** The header's bell: unread count on the button, the list in a popover; Escape or a click outside closes it. */
export function NotificationsMenu() {
  const panelId = useId();
  const [open, setOpen] = useState(false);
  const button = useRef<HTMLButtonElement>(null);
  const root = useRef<HTMLDivElement>(null);
  const panel = useRef<HTMLDivElement>(null);
  const navigate = useNavigate();
  const notifications = useNotifications();
  const markRead = useMarkNotificationsRead();
  const items = notifications.data ?? [];
  const unread = items.filter((n) => !n.read).length;

  const close = (refocus: boolean) => {
    setOpen(false);
    if (refocus) button.current?.focus();
  };

  useEffect(() => {
    if (!open) return;
    const first =
      panel.current?.querySelector<HTMLElement>('li button') ??
      panel.current?.querySelector<HTMLElement>('button:not([disabled])');
    first?.focus();
    const outside = (e: PointerEvent) => {
      if (e.target instanceof Node && !root.current?.contains(e.target)) setOpen(false);
    };
    document.addEventListener('pointerdown', outside);
    return () => document.removeEventListener('pointerdown', outside);
  }, [open]);

  const openItem = (n: Notification) => {
    if (!n.read) markRead.mutate([n.id]);
    close(false);
    void navigate(notificationPath(n));
  };

  return (
    <div
      ref={root}
      className="relative"
      onKeyDown={(e) => {
        if (e.key === 'Escape' && open) {
          e.preventDefault();
          close(true);
        }
      }}
    >
      <button
        ref={button}
        type="button"
        aria-label={unread ? `Notifications, ${unread} unread` : 'Notifications'}
        aria-expanded={open}
        aria-controls={open ? panelId : undefined}
        onClick={() => setOpen((o) => !o)}
        className="inline-flex min-h-11 items-center gap-2 rounded-lg px-3 text-sm font-semibold text-ink-soft hover:bg-sunken"
      >
        Notifications
        {unread > 0 && (
          <span
            aria-hidden="true"
            className="min-w-6 rounded-full bg-glow px-1.5 text-center font-mono text-xs leading-6 text-white dark:text-bakelite"
          >
            {unread > 99 ? '99+' : unread}
          </span>
        )}
      </button>
      {open && (
        <div
          ref={panel}
          id={panelId}
          role="region"
          aria-label="Notifications"
          className="absolute right-0 z-20 mt-1 w-[min(24rem,calc(100vw-2rem))] rounded-xl border border-rule bg-panel p-2 shadow-lg"
        >
          <div className="flex items-center justify-between gap-2 px-2 pb-1">
            <p className="font-bold">Notifications</p>
            <button
              type="button"
              disabled={!unread || markRead.isPending}
              onClick={() => markRead.mutate(undefined)}
              className="min-h-11 rounded-lg px-2 text-sm hover:bg-sunken disabled:opacity-50"
            >
              Mark all read
            </button>
          </div>
          {notifications.isPending ? (
            <p className="px-2 py-3 text-sm text-ink-soft">Fetching…</p>
          ) : notifications.isError ? (
            <p role="alert" className="px-2 py-3 text-sm text-danger">
              {notifications.error.message}
            </p>
          ) : items.length === 0 ? (
            <p className="px-2 py-3 text-sm text-ink-soft">Nothing new.</p>
          ) : (
            <ul className="max-h-96 overflow-y-auto">
              {items.map((n) => (
                <li key={n.id}>
                  <button
                    type="button"
                    onClick={() => openItem(n)}
                    className="flex w-full gap-2 rounded-lg px-2 py-2 text-left hover:bg-sunken"
                  >
                    <span aria-hidden="true" className="w-5 shrink-0 text-center font-mono font-bold text-glow-strong">
                      {kindGlyph[n.kind]}
                    </span>
                    <span className="min-w-0 flex-1">
                      <span className={`block break-words ${n.read ? 'text-ink-soft' : 'font-semibold'}`}>
                        {!n.read && <span className="sr-only">Unread: </span>}
                        {n.summary}
                      </span>
                      <time dateTime={n.createdAt} title={fullTime(n.createdAt)} className="text-xs text-ink-soft">
                        {relativeTime(n.createdAt)}
                      </time>
                    </span>
                  </button>
                </li>
              ))}
            </ul>
          )}
          {markRead.isError && (
            <p role="alert" className="px-2 pt-1 text-sm text-danger">
              {markRead.error.message}
            </p>
          )}
        </div>
      )}
    </div>
  );
}
