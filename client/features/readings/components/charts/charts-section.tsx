import { PARAMETER_KEYS } from '@shared/care/parameters';
import { DAY_MS } from '@shared/care/time';
import type { CareProfile } from '@shared/care/profiles';
import type { TankEventView, WaterTestView } from '@shared/schemas/tank-views';
import { seriesOf } from '@client/lib/chart-data';
import type { UnitPrefs } from '@client/lib/display-units';
import { latestValues } from '@client/lib/latest-values';
import { NitrogenChart } from './nitrogen-chart';
import { ParameterChart, type ChartFrame } from './parameter-chart';

/** A chart per parameter with readings in the period; the combined nitrogen chart first while the tank cycles. */
export function ChartsSection({
  tests,
  waterChanges,
  profile,
  prefs,
  from,
  now,
  cycling,
}: {
  tests: readonly WaterTestView[];
  waterChanges: readonly TankEventView[];
  profile: CareProfile | undefined;
  prefs: UnitPrefs;
  from: number | null;
  now: number;
  cycling: boolean;
}) {
  const times = tests.map((t) => Date.parse(t.takenAt));
  const first = times.length ? Math.min(...times) : now;
  // No empty months on the left when the records begin inside the period.
  const start = Math.max(from ?? first, first - DAY_MS);
  const to = Math.max(now, ...times);
  const frame: ChartFrame = {
    from: start,
    to,
    waterChanges: waterChanges.map((e) => Date.parse(e.occurredAt)).filter((t) => t >= start && t <= to),
  };
  const latest = latestValues(tests);
  const charted = PARAMETER_KEYS.filter((k) => latest[k]);
  return (
    <div className="space-y-4">
      {cycling ? <NitrogenChart tests={tests} frame={frame} /> : null}
      <div className="grid gap-4 lg:grid-cols-2">
        {charted.map((k) => (
          <ParameterChart
            key={k}
            parameter={k}
            points={seriesOf(tests, k, prefs)}
            canonicalLatest={latest[k]!.value}
            profile={profile}
            prefs={prefs}
            frame={frame}
          />
        ))}
      </div>
    </div>
  );
}
