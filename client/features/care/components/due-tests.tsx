import { useState } from 'react';
import { groupDueByDay, parameterInfo } from '@shared/care';
import { formatDay } from '@client/lib/date-format';
import type { CareSummary } from '../api/care';

const CHIP = {
  overdue: 'bg-danger-soft text-danger ring-danger/30',
  today: 'bg-watch-soft text-watch ring-watch/30',
  later: 'bg-surface text-ink-muted ring-line',
} as const;

/** Which tests are overdue, due today or next, by the keeper's own calendar (the same grouping as the home). */
export function DueTests({ due, timeZone }: { due: CareSummary['due']; timeZone: string }) {
  const [openedAt] = useState(() => Date.now());
  if (due.length === 0) return null;
  const g = groupDueByDay(due, { now: new Date(openedAt).toISOString(), timeZone });
  const rows = [
    ...g.overdue.map((d) => ({
      d,
      tone: 'overdue' as const,
      text: d.lastTestedAt ? `${d.daysLate} day${d.daysLate === 1 ? '' : 's'} late` : 'not tested yet',
    })),
    ...g.dueToday.map((d) => ({ d, tone: 'today' as const, text: 'due today' })),
    ...g.later.map((d) => ({ d, tone: 'later' as const, text: `next ${formatDay(d.dueAt)}` })),
  ];
  return (
    <section aria-labelledby="due-heading">
      <h3 id="due-heading" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">
        Tests to do
      </h3>
      <ul className="mt-2 flex flex-wrap gap-2">
        {rows.map(({ d, tone, text }) => (
          <li key={d.parameter} className={`rounded-full px-3 py-1 text-sm font-bold ring-1 ${CHIP[tone]}`}>
            {parameterInfo(d.parameter).label}: {text}
            <span className="sr-only"> (every {d.cadenceDays} days)</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
