import { Link } from 'react-router';
import { PARAMETER_KEYS } from '@shared/care/parameters';
import type { CareProfile } from '@shared/care/profiles';
import { TANK_EVENT_KIND_LABELS } from '@shared/constants/tank-labels';
import type { PhotoView, TimelineItem } from '@shared/schemas/tank-views';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { useTimeline } from '../../api/events';
import { verdictFor } from '@client/lib/bands';
import { formatDayTime } from '@client/lib/date-format';
import { describeEvent } from '@client/lib/describe-event';
import { formatLabelled, type UnitPrefs } from '@client/lib/display-units';
import { KindIcon } from '../kind-icon';
import { VerdictIcon, verdictTone } from '@client/components/ui/verdict-mark';

function Photos({ photos }: { photos: PhotoView[] }) {
  if (!photos.length) return null;
  return (
    <ul className="mt-2 flex flex-wrap gap-2">
      {photos.map((p) => (
        <li key={p.id}>
          <a href={p.url} target="_blank" rel="noreferrer">
            <img
              src={p.thumbUrl}
              alt={p.caption || 'Photo'}
              loading="lazy"
              className="size-16 rounded-lg object-cover ring-1 ring-line"
            />
          </a>
        </li>
      ))}
    </ul>
  );
}

function Entry({
  item,
  profile,
  prefs,
  tankId,
  editable,
}: {
  item: TimelineItem;
  profile: CareProfile | undefined;
  prefs: UnitPrefs;
  tankId: string;
  editable: boolean;
}) {
  const kind = item.type === 'water-test' ? 'water-test' : item.event.kind;
  const title = item.type === 'water-test' ? 'Water test' : TANK_EVENT_KIND_LABELS[item.event.kind];
  return (
    <li className="relative flex gap-3 py-3">
      <span className="grid size-9 shrink-0 place-items-center rounded-full bg-tint text-ink-muted">
        <KindIcon kind={kind} />
      </span>
      <div className="min-w-0 flex-1">
        <p className="flex flex-wrap items-baseline justify-between gap-x-2">
          <strong className="text-ink">{title}</strong>
          <time dateTime={item.at} className="text-sm text-ink-muted">
            {formatDayTime(item.at)}
          </time>
        </p>
        {item.type === 'water-test' ? (
          <>
            <ul className="mt-1 flex flex-wrap gap-1.5">
              {PARAMETER_KEYS.filter((k) => item.waterTest.values[k] !== undefined).map((k) => {
                const v = item.waterTest.values[k]!;
                const verdict = verdictFor(k, v, profile, prefs);
                return (
                  <li
                    key={k}
                    className={`inline-flex items-center gap-1 rounded-full bg-tint px-2 py-0.5 text-sm font-bold ${verdict ? verdictTone(verdict.level) : 'text-ink-soft'}`}
                  >
                    {verdict && verdict.level !== 'ok' ? (
                      <VerdictIcon level={verdict.level} direction={verdict.direction} />
                    ) : null}
                    <span className="text-ink">{formatLabelled(k, v, prefs)}</span>
                    {verdict && verdict.level !== 'ok' ? (
                      <span className="sr-only">{verdict.text}</span>
                    ) : null}
                  </li>
                );
              })}
            </ul>
            {item.waterTest.note ? <p className="mt-1 text-sm text-ink-soft">{item.waterTest.note}</p> : null}
            <p className="mt-1 flex gap-3 text-sm">
              {item.waterTest.origin === 'import' ? <span className="text-ink-muted">Imported</span> : null}
              {editable ? (
                <Link
                  to={`/tanks/${tankId}/tests/${item.waterTest.id}/edit`}
                  className="font-bold text-link underline"
                >
                  Edit
                </Link>
              ) : null}
            </p>
            <Photos photos={item.waterTest.photos} />
          </>
        ) : (
          <>
            {describeEvent(item.event, prefs).map((line) => (
              <p key={line} className="text-sm text-ink-soft">
                {line}
              </p>
            ))}
            {item.event.note ? <p className="mt-1 text-sm text-ink-muted">{item.event.note}</p> : null}
            <Photos photos={item.event.photos} />
          </>
        )}
      </div>
    </li>
  );
}

/** Tests, events and observations, newest first, a page at a time. */
export function Timeline({
  clubId,
  tankId,
  profile,
  prefs,
  editable,
}: {
  clubId: string;
  tankId: string;
  profile: CareProfile | undefined;
  prefs: UnitPrefs;
  editable: boolean;
}) {
  const timeline = useTimeline(clubId, tankId);
  if (timeline.isPending) return <Loading label="Loading the timeline…" />;
  if (timeline.isError) return <Notice tone="error">{timeline.error.message}</Notice>;
  const items = timeline.data.pages.flatMap((p) => p.items);
  if (items.length === 0)
    return (
      <p className="text-ink-muted">
        Nothing logged yet. Tests, water changes and what you notice about the animals will show up here.
      </p>
    );
  return (
    <div>
      <ol className="divide-y divide-line">
        {items.map((item) => (
          <Entry
            key={`${item.type}-${item.type === 'water-test' ? item.waterTest.id : item.event.id}`}
            item={item}
            profile={profile}
            prefs={prefs}
            tankId={tankId}
            editable={editable}
          />
        ))}
      </ol>
      {timeline.hasNextPage ? (
        <Button
          variant="secondary"
          className="mt-2 w-full"
          busy={timeline.isFetchingNextPage}
          onClick={() => void timeline.fetchNextPage()}
        >
          Show older entries
        </Button>
      ) : null}
    </div>
  );
}
