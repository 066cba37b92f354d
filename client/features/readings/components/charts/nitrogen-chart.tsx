import { ComposedChart, Legend, Line, ResponsiveContainer, Tooltip, YAxis } from 'recharts';
import { parameterInfo } from '@shared/care/parameters';
import type { WaterTestView } from '@shared/schemas/tank-views';
import { ChartFigures } from '@client/components/charts/chart-figures';
import { ChartTooltip } from '@client/components/charts/chart-tooltip';
import { gridLines, markerLines, timeAxis } from '@client/components/charts/time-chart-parts';
import { CHART_COLOURS } from '@client/lib/chart-data';
import { waterChangeMarkers, type ChartFrame } from './parameter-chart';

const SERIES = [
  { key: 'ammonia', axis: 'low', colour: CHART_COLOURS.ammonia, dash: undefined, shape: 'circle' },
  { key: 'nitrite', axis: 'low', colour: CHART_COLOURS.nitrite, dash: '6 3', shape: 'square' },
  { key: 'nitrate', axis: 'high', colour: CHART_COLOURS.nitrate, dash: '2 3', shape: 'diamond' },
] as const;

type Row = { t: number } & Partial<Record<(typeof SERIES)[number]['key'], number>>;

function Dot({
  cx,
  cy,
  shape,
  colour,
}: {
  cx?: number;
  cy?: number;
  shape: (typeof SERIES)[number]['shape'];
  colour: string;
}) {
  if (cx === undefined || cy === undefined || Number.isNaN(cy)) return null;
  if (shape === 'square') return <rect x={cx - 3.5} y={cy - 3.5} width={7} height={7} fill={colour} />;
  if (shape === 'diamond')
    return <path d={`M${cx} ${cy - 5}L${cx + 5} ${cy}L${cx} ${cy + 5}L${cx - 5} ${cy}Z`} fill={colour} />;
  return <circle cx={cx} cy={cy} r={3.5} fill={colour} />;
}

/**
 * The nitrogen cycle on one chart: ammonia rises first, then nitrite, then nitrate as the bacteria settle in.
 * Nitrate runs far higher, so it has its own axis on the right. Each line has its own dash and dot shape.
 */
export function NitrogenChart({ tests, frame }: { tests: readonly WaterTestView[]; frame: ChartFrame }) {
  const rows: Row[] = tests
    .filter((t) => SERIES.some((s) => t.values[s.key] !== undefined))
    .map((t) => ({
      t: Date.parse(t.takenAt),
      ammonia: t.values.ammonia,
      nitrite: t.values.nitrite,
      nitrate: t.values.nitrate,
    }))
    .sort((a, b) => a.t - b.t);
  if (rows.length === 0) return null;
  const label = (k: (typeof SERIES)[number]['key']) => `${parameterInfo(k).label} (${parameterInfo(k).unit})`;
  const last = rows[rows.length - 1]!;
  const lastWords = SERIES.filter((s) => last[s.key] !== undefined).map(
    (s) => `${parameterInfo(s.key).label.toLowerCase()} ${Number(last[s.key]!.toFixed(2))}`,
  );
  const summary = `Ammonia, nitrite and nitrate over time: ${rows.length} ${rows.length === 1 ? 'test' : 'tests'}${lastWords.length ? `, the latest ${lastWords.join(', ')}` : ''}.`;
  return (
    <figure className="rounded-card bg-surface p-4 shadow-card" data-chart="nitrogen-cycle">
      <figcaption>
        <h3 className="font-extrabold text-ink">The nitrogen cycle</h3>
        <p className="text-sm text-ink-muted">
          While a tank cycles, ammonia peaks first, then nitrite; the tank is cycled when both stay at 0 and
          only nitrate is left.
        </p>
      </figcaption>
      <div role="img" aria-label={summary} className="mt-2 h-64">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={rows} margin={{ top: 10, right: 0, bottom: 0, left: 0 }}>
            {gridLines()}
            {timeAxis([frame.from, frame.to])}
            <YAxis
              yAxisId="low"
              width={44}
              stroke={CHART_COLOURS.axis}
              fontSize={12}
              domain={[0, 'auto']}
              label={{
                value: 'NH3 · NO2',
                angle: -90,
                position: 'insideLeft',
                fontSize: 11,
                fill: CHART_COLOURS.axis,
              }}
            />
            <YAxis
              yAxisId="high"
              orientation="right"
              width={44}
              stroke={CHART_COLOURS.nitrate}
              fontSize={12}
              domain={[0, 'auto']}
              label={{
                value: 'NO3',
                angle: 90,
                position: 'insideRight',
                fontSize: 11,
                fill: CHART_COLOURS.nitrate,
              }}
            />
            {markerLines(waterChangeMarkers(frame), 'low')}
            <Tooltip content={<ChartTooltip format={(name, v) => `${name}: ${Number(v.toFixed(2))}`} />} />
            <Legend verticalAlign="bottom" wrapperStyle={{ fontSize: 12 }} />
            {SERIES.map((s) => (
              <Line
                key={s.key}
                yAxisId={s.axis}
                dataKey={s.key}
                name={label(s.key)}
                type="monotone"
                stroke={s.colour}
                strokeWidth={2}
                strokeDasharray={s.dash}
                connectNulls
                isAnimationActive={false}
                dot={(props: { cx?: number; cy?: number; index?: number }) => (
                  <Dot
                    key={`${s.key}-${props.index}`}
                    cx={props.cx}
                    cy={props.cy}
                    shape={s.shape}
                    colour={s.colour}
                  />
                )}
              />
            ))}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <ChartFigures
        summary={summary}
        columns={SERIES.map((s) => ({
          label: label(s.key),
          format: (v: number) => String(Number(v.toFixed(2))),
        }))}
        rows={rows.map((r) => ({ t: r.t, values: SERIES.map((s) => r[s.key]) }))}
      />
    </figure>
  );
}
