import { useId, useState } from 'react';
import { formatDayTime } from '@client/lib/date-format';

/** A long history would make a table no one reads: the newest rows, and a word about the rest. */
const MOST_ROWS = 60;

export interface FigureColumn {
  label: string;
  format: (v: number) => string;
}

/**
 * The text alternative of a chart: the figures it draws, as a table behind a button, newest first. The
 * chart's summary sentence is the table's caption.
 */
export function ChartFigures({
  summary,
  columns,
  rows,
}: {
  summary: string;
  columns: readonly FigureColumn[];
  rows: readonly { t: number; values: readonly (number | undefined)[] }[];
}) {
  const [open, setOpen] = useState(false);
  const id = useId();
  const newest = [...rows].sort((a, b) => b.t - a.t).slice(0, MOST_ROWS);
  return (
    <div className="mt-2">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={id}
        onClick={() => setOpen((v) => !v)}
        className="min-h-touch text-sm font-bold text-link underline"
      >
        {open ? 'Hide the figures' : 'Show the figures as a table'}
      </button>
      {open ? (
        <div id={id} className="mt-1 max-h-72 overflow-auto rounded-control ring-1 ring-line">
          <table className="w-full text-left text-sm">
            <caption className="p-2 text-left text-ink-muted">
              {summary}
              {rows.length > MOST_ROWS
                ? ` The newest ${MOST_ROWS} of ${rows.length.toLocaleString()} are listed.`
                : ''}
            </caption>
            <thead className="sticky top-0 bg-tint text-ink-soft">
              <tr>
                <th scope="col" className="px-2 py-1">
                  Taken
                </th>
                {columns.map((c) => (
                  <th key={c.label} scope="col" className="px-2 py-1 text-right">
                    {c.label}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="divide-y divide-line text-ink">
              {newest.map((r) => (
                <tr key={r.t}>
                  <th scope="row" className="px-2 py-1 font-semibold whitespace-nowrap">
                    {formatDayTime(r.t)}
                  </th>
                  {r.values.map((v, i) => (
                    <td key={columns[i]!.label} className="px-2 py-1 text-right tabular-nums">
                      {v === undefined ? '–' : columns[i]!.format(v)}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </div>
  );
}
