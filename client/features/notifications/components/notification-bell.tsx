import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useId, useRef, useState } from 'react';
import { useNavigate } from 'react-router';
import { Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { useSocketEvent, useSocketReconnect } from '@client/lib/socket';
import { notificationKeys, useMarkAllRead, useMarkRead, useNotifications } from '../api/notifications';
import { NotificationList } from './notification-list';

function BellIcon() {
  return (
    <svg
      viewBox="0 0 24 24"
      className="size-6"
      fill="none"
      stroke="currentColor"
      strokeWidth="2"
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden
    >
      <path d="M6 8a6 6 0 1 1 12 0c0 7 3 9 3 9H3s3-2 3-9" />
      <path d="M10.3 21a1.94 1.94 0 0 0 3.4 0" />
    </svg>
  );
}

/** The header's bell: unread count, kept live by the socket, and a dropdown of the newest notifications. */
export function NotificationBell() {
  const qc = useQueryClient();
  const navigate = useNavigate();
  const list = useNotifications();
  const markRead = useMarkRead();
  const markAll = useMarkAllRead();
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const panelId = useId();
  const refresh = () => void qc.invalidateQueries({ queryKey: notificationKeys.list() });
  useSocketEvent('notification', refresh);
  useSocketReconnect(refresh);

  useEffect(() => {
    if (!open) return;
    const onPointer = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) setOpen(false);
    };
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && setOpen(false);
    document.addEventListener('pointerdown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, [open]);

  const count = list.data?.unreadCount ?? 0;
  const items = list.data?.notifications ?? [];
  const label = count === 0 ? 'Notifications, none unread' : `Notifications, ${count} unread`;

  return (
    <div ref={box} className="relative">
      <button
        type="button"
        aria-label={label}
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((o) => !o)}
        className="relative flex size-touch items-center justify-center rounded-full text-on-chrome hover:bg-chrome-active"
      >
        <BellIcon />
        {count > 0 ? (
          <span
            data-testid="unread-count"
            className="absolute -top-0.5 -right-0.5 min-w-5 rounded-full bg-danger-solid px-1 text-center text-xs leading-5 font-extrabold text-on-danger"
          >
            {count > 99 ? '99+' : count}
          </span>
        ) : null}
      </button>
      {open ? (
        <div
          id={panelId}
          role="dialog"
          aria-label="Notifications"
          className="z-30 mt-2 rounded-card bg-surface shadow-card ring-1 ring-line max-sm:fixed max-sm:inset-x-3 max-sm:top-16 sm:absolute sm:right-0 sm:w-[22rem]"
        >
          <div className="flex items-center justify-between gap-2 border-b border-line px-4 py-2">
            <h2 className="font-extrabold text-ink">Notifications</h2>
            {count > 0 ? (
              <button
                type="button"
                onClick={() => markAll.mutate()}
                disabled={markAll.isPending}
                className="min-h-touch rounded-full px-3 text-sm font-bold text-link hover:bg-tint disabled:opacity-50"
              >
                Mark all read
              </button>
            ) : null}
          </div>
          <div className="max-h-[60vh] overflow-y-auto p-1">
            {list.isPending ? (
              <div className="p-4">
                <Loading label="Loading…" />
              </div>
            ) : list.isError ? (
              <div className="p-3">
                <Notice tone="error">Could not load your notifications. {list.error.message}</Notice>
              </div>
            ) : items.length === 0 ? (
              <p className="p-4 text-sm text-ink-muted">
                Nothing yet. When a mentor answers, a test needs attention or someone asks for help, it shows
                up here.
              </p>
            ) : (
              <NotificationList
                items={items}
                busyId={markRead.isPending ? markRead.variables : undefined}
                onMarkRead={(n) => markRead.mutate(n.id)}
                onOpen={(n) => {
                  if (!n.readAt) markRead.mutate(n.id);
                  setOpen(false);
                  navigate(n.link);
                }}
              />
            )}
          </div>
        </div>
      ) : null}
    </div>
  );
}
