import { CartesianGrid, ReferenceLine, XAxis } from 'recharts';
import { CHART_COLOURS } from '@client/lib/chart-data';
import { formatDay } from '@client/lib/date-format';

/** A moment marked across a time chart: a water change, the reading a question is about. */
export interface ChartMarker {
  at: number;
  label: string;
  colour: string;
  position?: 'insideTop' | 'insideTopLeft';
}

/*
 * The pieces every time chart shares, as functions returning the chart's own elements (Recharts reads its
 * children's types, so these are called in place rather than wrapped in components).
 */
export const gridLines = () => <CartesianGrid stroke={CHART_COLOURS.grid} vertical={false} />;

export const timeAxis = ([from, to]: readonly [number, number]) => (
  <XAxis
    dataKey="t"
    type="number"
    scale="time"
    domain={[from, to]}
    tickFormatter={formatDay}
    stroke={CHART_COLOURS.axis}
    fontSize={12}
    minTickGap={28}
  />
);

export const markerLines = (markers: readonly ChartMarker[], yAxisId?: string) =>
  markers.map((m) => (
    <ReferenceLine
      key={`${m.label}-${m.at}`}
      x={m.at}
      {...(yAxisId ? { yAxisId } : {})}
      stroke={m.colour}
      strokeDasharray="4 3"
      label={{ value: m.label, position: m.position ?? 'insideTop', fontSize: 11, fill: m.colour }}
    />
  ));
