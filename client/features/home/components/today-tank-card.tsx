import { Link } from 'react-router';
import { calendarDaysBetween } from '@shared/care';
import { SYSTEM_TYPE_LABELS } from '@shared/constants/tank-labels';
import type { HomeTank } from '@shared/schemas/home-views';
import { SeverityBadge } from '@client/components/ui/severity-badge';
import { formatDisplay, type UnitPrefs } from '@client/lib/display-units';
import { relativeTime } from '@client/lib/relative-time';
import { logTestPath } from '@client/lib/test-links';
import { shortLabel as label, stateInWords, tankToday, type StateTone } from '../lib/today';
import { LINK_BUTTON } from './link-button';

const TONE: Record<StateTone, string> = {
  settled: 'bg-ok-soft text-ok ring-ok/30',
  cycling: 'bg-tint text-ink-soft ring-line',
  trouble: 'bg-danger-soft text-danger ring-danger/30',
};

/** Counted on the member's calendar, so it agrees with "today" above. */
const inDays = (n: number) => (n === 1 ? 'tomorrow' : `in ${n} days`);
const listOf = (items: string[]) => new Intl.ListFormat('en', { type: 'conjunction' }).format(items);

function LastTest({ test, prefs }: { test: HomeTank['lastTest']; prefs: UnitPrefs }) {
  if (!test) return <p className="text-sm text-ink-muted">No tests in the last few months.</p>;
  const figures = (Object.entries(test.values) as [keyof typeof test.values, number][]).slice(0, 4);
  return (
    <p className="text-sm text-ink-muted" data-testid="last-test">
      Last test{' '}
      <time dateTime={test.takenAt} title={new Date(test.takenAt).toLocaleString()}>
        {relativeTime(test.takenAt)}
      </time>
      {figures.length ? ': ' : ''}
      {figures
        .map(([k, v]) => {
          const shown = formatDisplay(k, v, prefs);
          return shown.startsWith(label(k)) ? shown : `${label(k)} ${shown}`;
        })
        .join(' · ')}
    </p>
  );
}

/** One of the member's tanks: what state it is in, what is wrong, what to test today, and one action to do it. */
export function TodayTankCard({
  tank,
  now,
  timeZone,
  prefs,
}: {
  tank: HomeTank;
  now: number;
  timeZone: string;
  prefs: UnitPrefs;
}) {
  const { groups, toTest } = tankToday(tank, now, timeZone);
  const state = stateInWords(tank);
  const next = groups.later[0];
  const headingId = `tank-${tank.id}`;
  return (
    <li
      className="rounded-card bg-surface p-4 shadow-card sm:p-5"
      aria-labelledby={headingId}
      data-tank-id={tank.id}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 id={headingId} className="text-lg font-extrabold text-ink">
            <Link to={`/tanks/${tank.id}`} className="hover:underline">
              {tank.name}
            </Link>
          </h3>
          <p className="text-sm text-ink-muted">{SYSTEM_TYPE_LABELS[tank.systemType]}</p>
        </div>
        <span className={`rounded-full px-3 py-1 text-sm font-bold ring-1 ${TONE[state.tone]}`}>
          {state.text}
        </span>
      </div>

      {tank.worstConcern ? (
        <Link
          to={`/tanks/${tank.id}`}
          className="mt-3 flex items-start gap-2 rounded-xl bg-canvas px-3 py-2 text-sm text-ink ring-1 ring-line hover:bg-tint"
        >
          <SeverityBadge severity={tank.worstConcern.severity} />
          <span>
            {tank.worstConcern.reason}
            {tank.liveConcerns > 1 ? (
              <span className="font-bold text-ink-muted">
                {' '}
                +{tank.liveConcerns - 1} more on the tank page
              </span>
            ) : null}
          </span>
        </Link>
      ) : null}

      <section className="mt-3" aria-label={`Tests for ${tank.name}`}>
        {toTest.length ? (
          <>
            <h4 className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">To test today</h4>
            <ul className="mt-2 flex flex-wrap gap-2">
              {groups.overdue.map((d) => (
                <li
                  key={d.parameter}
                  className="rounded-full bg-danger-soft px-3 py-1 text-sm font-bold text-danger ring-1 ring-danger/30"
                  data-due="overdue"
                >
                  <span aria-hidden>▲ </span>
                  {label(d.parameter)}:{' '}
                  {d.lastTestedAt ? `${d.daysLate} day${d.daysLate === 1 ? '' : 's'} late` : 'not tested yet'}
                </li>
              ))}
              {groups.dueToday.map((d) => (
                <li
                  key={d.parameter}
                  className="rounded-full bg-watch-soft px-3 py-1 text-sm font-bold text-watch ring-1 ring-watch/30"
                  data-due="today"
                >
                  <span aria-hidden>● </span>
                  {label(d.parameter)}: due today
                </li>
              ))}
            </ul>
            <Link
              to={logTestPath(tank.id, toTest)}
              className={`${LINK_BUTTON.primary} mt-3 min-h-14 w-full text-lg`}
            >
              {toTest.length <= 2 ? `Log ${listOf(toTest.map(label))}` : `Log today’s ${toTest.length} tests`}
            </Link>
          </>
        ) : (
          <>
            <p className="flex items-center gap-2 font-bold text-ok">
              <span aria-hidden>✓</span> Nothing to test today.
              {next ? (
                <span className="font-normal text-ink-muted">
                  Next: {label(next.parameter)} {inDays(calendarDaysBetween(groups.today, next.dueDay))}.
                </span>
              ) : null}
            </p>
            <Link to={logTestPath(tank.id)} className={`${LINK_BUTTON.secondary} mt-3 w-full`}>
              Log a test anyway
            </Link>
          </>
        )}
      </section>
      <div className="mt-3">
        <LastTest test={tank.lastTest} prefs={prefs} />
      </div>
    </li>
  );
}
