import { lazy, Suspense, useMemo, useState } from 'react';
import type { CareProfile } from '@shared/care/profiles';
import { Card, Notice } from '@client/components/ui/card';
import { Segmented } from '@client/components/ui/segmented';
import { Loading } from '@client/components/ui/skeleton';
import { useWaterChanges } from '../../api/events';
import { useTestsSince } from '../../api/water-tests';
import type { UnitPrefs } from '@client/lib/display-units';
import { TestsTable } from './tests-table';

// The chart library is the largest part of the page: it loads on its own, after the tank's facts.
const ChartsSection = lazy(() =>
  import('../charts/charts-section').then((m) => ({ default: m.ChartsSection })),
);

const RANGES = [
  { value: 30, label: '30 days' },
  { value: 90, label: '3 months' },
  { value: 365, label: 'A year' },
  { value: null, label: 'Everything' },
] as const;
type Days = (typeof RANGES)[number]['value'];

/** Start of the local day `days` ago: stable all day, so the query key does not change on every render. */
function startOf(days: Days): string | null {
  if (days === null) return null;
  const d = new Date();
  d.setHours(0, 0, 0, 0);
  d.setDate(d.getDate() - days);
  return d.toISOString();
}

/** The tank's readings over a chosen period: charts first, then the table of past tests. */
export function TankHistory({
  clubId,
  tankId,
  profile,
  prefs,
  cycling,
  editable,
}: {
  clubId: string;
  tankId: string;
  profile: CareProfile | undefined;
  prefs: UnitPrefs;
  cycling: boolean;
  editable: boolean;
}) {
  const [days, setDays] = useState<Days>(90);
  const [now] = useState(() => Date.now());
  const from = useMemo(() => startOf(days), [days]);
  const tests = useTestsSince(clubId, tankId, from);
  const waterChanges = useWaterChanges(clubId, tankId);
  const list = tests.data ?? [];

  return (
    <section aria-labelledby="readings-heading" className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="readings-heading" className="text-xl font-extrabold text-ink">
          Readings
        </h2>
        <Segmented<Days> label="Period shown" options={RANGES} value={days} onChange={setDays} />
      </div>
      {tests.isPending ? (
        <Card>
          <Loading label="Loading readings…" />
        </Card>
      ) : tests.isError ? (
        <Notice tone="error">{tests.error.message}</Notice>
      ) : list.length === 0 ? (
        <Card>
          <p className="text-ink-muted">
            No tests in this period
            {days !== null
              ? ': try a longer one'
              : ' yet. Your first test will draw the first point on each chart'}
            .
          </p>
        </Card>
      ) : (
        <>
          <Suspense
            fallback={
              <Card>
                <Loading label="Drawing the charts…" />
              </Card>
            }
          >
            <ChartsSection
              tests={list}
              waterChanges={waterChanges.data ?? []}
              profile={profile}
              prefs={prefs}
              from={from ? Date.parse(from) : null}
              now={now}
              cycling={cycling}
            />
          </Suspense>
          <Card>
            <h3 className="mb-3 text-lg font-extrabold text-ink">Past tests</h3>
            <TestsTable tests={list} prefs={prefs} editable={editable} tankId={tankId} />
          </Card>
        </>
      )}
    </section>
  );
}
