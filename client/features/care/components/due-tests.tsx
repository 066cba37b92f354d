import { parameterInfo } from '@shared/care';
import { formatDay } from '@client/lib/date-format';
import type { CareSummary } from '../api/care';

/** Which tests are due or overdue, most overdue first. */
export function DueTests({ due }: { due: CareSummary['due'] }) {
  const order = { overdue: 0, due: 1, ok: 2 } as const;
  const sorted = [...due].sort((a, b) => order[a.status] - order[b.status] || b.overdueByDays - a.overdueByDays);
  if (sorted.length === 0) return null;
  return (
    <section aria-labelledby="due-heading">
      <h3 id="due-heading" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">Tests to do</h3>
      <ul className="mt-2 flex flex-wrap gap-2">
        {sorted.map((d) => (
          <li
            key={d.parameter}
            className={`rounded-full px-3 py-1 text-sm font-bold ring-1 ${
              d.status === 'overdue' ? 'bg-danger-soft text-danger ring-danger/30' : d.status === 'due' ? 'bg-watch-soft text-watch ring-watch/30' : 'bg-surface text-ink-muted ring-line'
            }`}
          >
            {parameterInfo(d.parameter).label}:{' '}
            {d.status === 'overdue' ? `${d.overdueByDays} day${d.overdueByDays === 1 ? '' : 's'} late` : d.status === 'due' ? 'due today' : `next ${formatDay(d.dueAt)}`}
            <span className="sr-only"> (every {d.cadenceDays} days)</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
