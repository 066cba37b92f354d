import {
  ComposedChart,
  Line,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  YAxis,
} from 'recharts';
import { parameterInfo, type ParameterKey } from '@shared/care/parameters';
import type { Band } from '@shared/care/profiles';
import { bandToDisplay, CHART_COLOURS, niceTicks, yDomain, type Point } from '@client/lib/chart-data';
import { displayDecimals, displayUnit, type ReadingPrefs } from '@client/lib/display-units';
import { ChartFigures } from './chart-figures';
import { ChartTooltip } from './chart-tooltip';
import { gridLines, markerLines, timeAxis, type ChartMarker } from './time-chart-parts';

/** Past this many readings the dots would merge into a smear: the line alone reads better. */
const DOTS_UP_TO = 90;

export interface ParameterLineChartProps {
  parameter: ParameterKey;
  /** In the reader's units (`seriesOf`). */
  points: Point[];
  prefs: ReadingPrefs;
  /** The profile's bands, canonical: the ideal one shaded (a line when it is one value), the caution one faint. */
  range: { ideal: Band; caution: Band } | undefined;
  /** The x range shown, ms. */
  span: readonly [number, number];
  markers: readonly ChartMarker[];
  /** What the chart shows, in words, for screen readers. */
  summary: string;
  className: string;
}

/** One parameter's readings over time, against the ranges of the tank's profile: the chart the tank page and questions share. */
export function ParameterLineChart({
  parameter,
  points,
  prefs,
  range,
  span,
  markers,
  summary,
  className,
}: ParameterLineChartProps) {
  const unit = displayUnit(parameter, prefs);
  const decimals = displayDecimals(parameter, prefs);
  const ideal = range ? bandToDisplay(parameter, range.ideal, prefs) : undefined;
  const caution = range ? bandToDisplay(parameter, range.caution, prefs) : undefined;
  const y = niceTicks(
    yDomain(
      points.map((p) => p.v),
      ideal,
    ),
  );
  const format = (v: number) => `${v.toFixed(decimals)}${unit ? ` ${unit}` : ''}`;
  return (
    <>
      <div role="img" aria-label={summary} className={className}>
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={points} margin={{ top: 14, right: 8, bottom: 0, left: 0 }}>
            {gridLines()}
            {timeAxis(span)}
            <YAxis
              domain={y.domain}
              ticks={y.ticks}
              width={52}
              stroke={CHART_COLOURS.axis}
              fontSize={12}
              tickFormatter={(v: number) => String(Number(v.toFixed(Math.max(decimals, 2))))}
              allowDecimals
            />
            {caution ? (
              <ReferenceArea
                y1={caution[0]}
                y2={caution[1]}
                fill={CHART_COLOURS.caution}
                fillOpacity={0.07}
                ifOverflow="hidden"
              />
            ) : null}
            {ideal && ideal[1] > ideal[0] ? (
              <ReferenceArea
                y1={ideal[0]}
                y2={ideal[1]}
                fill={CHART_COLOURS.ideal}
                fillOpacity={0.18}
                ifOverflow="extendDomain"
              />
            ) : null}
            {ideal && ideal[1] === ideal[0] ? (
              <ReferenceLine y={ideal[0]} stroke={CHART_COLOURS.ideal} strokeWidth={3} strokeOpacity={0.5} />
            ) : null}
            {markerLines(markers)}
            <Tooltip content={<ChartTooltip format={(_n, v) => format(v)} />} />
            <Line
              type="monotone"
              dataKey="v"
              name={parameterInfo(parameter).label}
              stroke={CHART_COLOURS.line}
              strokeWidth={2}
              dot={points.length <= DOTS_UP_TO ? { r: 3.5, fill: CHART_COLOURS.line } : false}
              activeDot={{ r: 6 }}
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <ChartFigures
        summary={summary}
        columns={[{ label: parameterInfo(parameter).label, format }]}
        rows={points.map((p) => ({ t: p.t, values: [p.v] }))}
      />
    </>
  );
}
