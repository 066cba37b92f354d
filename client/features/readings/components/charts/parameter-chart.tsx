import { parameterInfo, type ParameterKey } from '@shared/care/parameters';
import type { CareProfile } from '@shared/care/profiles';
import { ParameterLineChart } from '@client/components/charts/parameter-line-chart';
import type { ChartMarker } from '@client/components/charts/time-chart-parts';
import { VerdictLine } from '@client/components/ui/verdict-mark';
import { bandText, verdictFor } from '@client/lib/bands';
import { CHART_COLOURS, type Point } from '@client/lib/chart-data';
import { displayUnit, formatDisplay, type ReadingPrefs } from '@client/lib/display-units';
import { relativeTime } from '@client/lib/relative-time';

export interface ChartFrame {
  /** The x range shown, ms. */
  from: number;
  to: number;
  /** Times of water changes inside the range, ms. */
  waterChanges: number[];
}

export const waterChangeMarkers = (frame: ChartFrame): ChartMarker[] =>
  frame.waterChanges.map((at) => ({ at, label: 'WC', colour: CHART_COLOURS.waterChange }));

/** One parameter over time, the profile's ideal band shaded and its caution band faint, water changes marked. */
export function ParameterChart({
  parameter,
  points,
  canonicalLatest,
  profile,
  prefs,
  frame,
}: {
  parameter: ParameterKey;
  points: Point[];
  canonicalLatest: number;
  profile: CareProfile | undefined;
  prefs: ReadingPrefs;
  frame: ChartFrame;
}) {
  const info = parameterInfo(parameter);
  const unit = displayUnit(parameter, prefs);
  const range = profile?.ranges[parameter];
  const latest = points[points.length - 1]!;
  const verdict = verdictFor(parameter, canonicalLatest, profile, prefs);
  const summary = `${info.label}: ${points.length} ${points.length === 1 ? 'reading' : 'readings'}, latest ${formatDisplay(parameter, canonicalLatest, prefs)} ${relativeTime(new Date(latest.t).toISOString())}.${range ? ` Ideal ${bandText(parameter, range.ideal, prefs)}.` : ''}`;

  return (
    <figure className="rounded-card bg-surface p-4 shadow-card" data-chart={parameter}>
      <figcaption className="flex flex-wrap items-baseline justify-between gap-x-3">
        <h3 className="font-extrabold text-ink">
          {info.label}
          {unit ? <span className="font-semibold text-ink-muted"> · {unit}</span> : null}
        </h3>
        <p className="text-lg font-extrabold text-ink">{formatDisplay(parameter, canonicalLatest, prefs)}</p>
      </figcaption>
      <ParameterLineChart
        parameter={parameter}
        points={points}
        prefs={prefs}
        range={range}
        span={[frame.from, frame.to]}
        markers={waterChangeMarkers(frame)}
        summary={summary}
        className="mt-2 h-44"
      />
      <div className="mt-2 space-y-1 text-sm text-ink-muted">
        {verdict ? <VerdictLine verdict={verdict} /> : null}
        <p>
          {range ? (
            <>
              {range.ideal[0] === range.ideal[1] ? 'Green line' : 'Green band'}: ideal{' '}
              {bandText(parameter, range.ideal, prefs)}.{' '}
            </>
          ) : null}
          {frame.waterChanges.length ? 'Dashed lines (WC): water changes.' : null}
        </p>
      </div>
    </figure>
  );
}
