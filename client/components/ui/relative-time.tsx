import { formatDayTime } from '@client/lib/date-format';
import { relativeTime } from '@client/lib/relative-time';

/** "2 days ago", with the exact date and time on hover and in the markup for machines and screen readers. */
export function RelativeTime({ at, className }: { at: string | Date; className?: string }) {
  const iso = typeof at === 'string' ? at : at.toISOString();
  return (
    <time dateTime={iso} title={formatDayTime(iso)} className={className}>
      {relativeTime(iso)}
    </time>
  );
}
