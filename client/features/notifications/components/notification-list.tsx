import type { NotificationView } from '@shared/schemas/notification-views';
import { RelativeTime } from '@client/components/ui/relative-time';

const ACCENT: Partial<Record<NotificationView['kind'], string>> = {
  'concern.urgent': 'bg-danger-solid',
  'concern.caution': 'bg-watch',
};

/** The bell's list: open an item (which marks it read), or just mark it read. */
export function NotificationList(p: {
  items: NotificationView[];
  onOpen(n: NotificationView): void;
  onMarkRead(n: NotificationView): void;
  busyId?: string;
}) {
  return (
    <ul className="divide-y divide-line">
      {p.items.map((n) => {
        const unread = n.readAt === null;
        return (
          <li key={n.id} className={`flex items-start gap-2 px-2 py-2 ${unread ? 'bg-tint/60' : ''}`}>
            <span
              aria-hidden
              className={`mt-3 size-2.5 shrink-0 rounded-full ${unread ? (ACCENT[n.kind] ?? 'bg-accent') : 'bg-transparent'}`}
            />
            <button
              type="button"
              onClick={() => p.onOpen(n)}
              className="min-h-touch flex-1 rounded-lg px-1 py-1 text-left hover:bg-tint"
            >
              <span
                className={`block text-sm ${unread ? 'font-extrabold text-ink' : 'font-semibold text-ink-soft'}`}
              >
                {n.title}
              </span>
              {n.body ? (
                <span className="mt-0.5 line-clamp-2 block text-sm text-ink-muted">{n.body}</span>
              ) : null}
              <span className="mt-0.5 block text-xs text-ink-muted">
                {n.clubName} · <RelativeTime at={n.createdAt} />
                {unread ? <span className="sr-only"> · unread</span> : null}
              </span>
            </button>
            {unread ? (
              <button
                type="button"
                onClick={() => p.onMarkRead(n)}
                disabled={p.busyId === n.id}
                className="min-h-touch shrink-0 rounded-full px-3 text-xs font-bold text-link hover:bg-tint-strong disabled:opacity-50"
                aria-label={`Mark “${n.title}” as read`}
              >
                Mark read
              </button>
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}
