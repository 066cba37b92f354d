import { CartesianGrid, ComposedChart, Line, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { parameterInfo, type ParameterKey } from '../../../../../shared/care/parameters';
import type { CareProfile } from '../../../../../shared/care/profiles';
import { bandText, verdictFor } from '../../lib/bands';
import { bandToDisplay, CHART_COLOURS, formatDay, niceTicks, yDomain, type Point } from '../../lib/chart-data';
import { displayDecimals, displayUnit, formatDisplay, type UnitPrefs } from '../../lib/display-units';
import { timeAgo } from '../../lib/time-since';
import { VerdictLine } from '../verdict-mark';
import { ChartTooltip } from './chart-tooltip';

/** Past this many readings the dots would merge into a smear: the line alone reads better. */
const DOTS_UP_TO = 90;

export interface ChartFrame {
  /** The x range shown, ms. */
  from: number;
  to: number;
  /** Times of water changes inside the range, ms. */
  waterChanges: number[];
}

/** One parameter over time, the profile's ideal band shaded and its caution band faint, water changes marked. */
export function ParameterChart({ parameter, points, canonicalLatest, profile, prefs, frame }: { parameter: ParameterKey; points: Point[]; canonicalLatest: number; profile: CareProfile | undefined; prefs: UnitPrefs; frame: ChartFrame }) {
  const info = parameterInfo(parameter);
  const unit = displayUnit(parameter, prefs);
  const range = profile?.ranges[parameter];
  const ideal = range ? bandToDisplay(parameter, range.ideal, prefs) : undefined;
  const caution = range ? bandToDisplay(parameter, range.caution, prefs) : undefined;
  const y = niceTicks(yDomain(points.map((p) => p.v), ideal));
  const latest = points[points.length - 1]!;
  const verdict = verdictFor(parameter, canonicalLatest, profile, prefs);
  const decimals = displayDecimals(parameter, prefs);
  const summary = `${info.label}: ${points.length} ${points.length === 1 ? 'reading' : 'readings'}, latest ${formatDisplay(parameter, canonicalLatest, prefs)} ${timeAgo(new Date(latest.t).toISOString())}.${range ? ` Ideal ${bandText(parameter, range.ideal, prefs)}.` : ''}`;

  return (
    <figure className="rounded-card bg-white p-4 shadow-card" data-chart={parameter}>
      <figcaption className="flex flex-wrap items-baseline justify-between gap-x-3">
        <h3 className="font-extrabold text-tide-900">
          {info.label}
          {unit ? <span className="font-semibold text-tide-600"> · {unit}</span> : null}
        </h3>
        <p className="text-lg font-extrabold text-tide-900">{formatDisplay(parameter, canonicalLatest, prefs)}</p>
      </figcaption>
      <div role="img" aria-label={summary} className="mt-2 h-44">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={points} margin={{ top: 14, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid stroke={CHART_COLOURS.grid} vertical={false} />
            <XAxis dataKey="t" type="number" scale="time" domain={[frame.from, frame.to]} tickFormatter={formatDay} stroke={CHART_COLOURS.axis} fontSize={12} minTickGap={28} />
            <YAxis domain={y.domain} ticks={y.ticks} width={52} stroke={CHART_COLOURS.axis} fontSize={12} tickFormatter={(v: number) => String(Number(v.toFixed(Math.max(decimals, 2))))} allowDecimals />
            {caution ? <ReferenceArea y1={caution[0]} y2={caution[1]} fill={CHART_COLOURS.caution} fillOpacity={0.07} ifOverflow="hidden" /> : null}
            {ideal && ideal[1] > ideal[0] ? <ReferenceArea y1={ideal[0]} y2={ideal[1]} fill={CHART_COLOURS.ideal} fillOpacity={0.18} ifOverflow="extendDomain" /> : null}
            {ideal && ideal[1] === ideal[0] ? <ReferenceLine y={ideal[0]} stroke={CHART_COLOURS.ideal} strokeWidth={3} strokeOpacity={0.5} /> : null}
            {frame.waterChanges.map((t) => (
              <ReferenceLine key={t} x={t} stroke={CHART_COLOURS.waterChange} strokeDasharray="4 3" label={{ value: 'WC', position: 'insideTop', fontSize: 10, fill: CHART_COLOURS.waterChange }} />
            ))}
            <Tooltip content={<ChartTooltip format={(_n, v) => `${v.toFixed(decimals)}${unit ? ` ${unit}` : ''}`} />} />
            <Line type="monotone" dataKey="v" name={info.label} stroke={CHART_COLOURS.line} strokeWidth={2} dot={points.length <= DOTS_UP_TO ? { r: 3.5, fill: CHART_COLOURS.line } : false} activeDot={{ r: 6 }} isAnimationActive={false} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <div className="mt-2 space-y-1 text-sm text-tide-700">
        {verdict ? <VerdictLine verdict={verdict} /> : null}
        <p>
          {range ? <>{range.ideal[0] === range.ideal[1] ? 'Green line' : 'Green band'}: ideal {bandText(parameter, range.ideal, prefs)}. </> : null}
          {frame.waterChanges.length ? 'Dashed lines (WC): water changes.' : null}
        </p>
      </div>
    </figure>
  );
}
