import { formatDayTime } from '@client/lib/date-format';

interface Entry {
  name?: string | number;
  value?: number | string | readonly (number | string)[];
  color?: string;
  payload?: { t?: number };
}

/** Tooltip body for the time charts: the date, then each value as the member reads it. */
export function ChartTooltip({
  active,
  payload,
  format,
}: {
  active?: boolean;
  payload?: readonly Entry[];
  format: (name: string, value: number) => string;
}) {
  if (!active || !payload?.length) return null;
  const t = payload[0]?.payload?.t;
  return (
    <div className="rounded-lg bg-surface px-3 py-2 text-sm shadow-card ring-1 ring-line">
      {t !== undefined ? <p className="font-bold text-ink">{formatDayTime(t)}</p> : null}
      {payload.map((p) =>
        typeof p.value === 'number' ? (
          <p key={String(p.name)} style={{ color: p.color }} className="font-semibold">
            {format(String(p.name), p.value)}
          </p>
        ) : null,
      )}
    </div>
  );
}
