import { Card, Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { useCareSummary } from '../api/care';
import { CautionFor } from '@client/components/ui/cautions';
import { ConcernList } from './concern-list';
import { CycleTimeline } from './cycle-timeline';
import { DueTests } from './due-tests';
import { ReadinessPanel } from './readiness-panel';

/** The tank page's judgement: what needs attention, the cycle, the tests due and readiness for animals. */
export function TankCarePanel({
  clubId,
  tankId,
  ownerId,
  phase,
  timeZone,
}: {
  clubId: string;
  tankId: string;
  ownerId: string;
  phase: 'cycling' | 'established';
  timeZone: string;
}) {
  const care = useCareSummary(clubId, tankId);
  if (care.isPending)
    return (
      <Card>
        <Loading label="Working out how the tank is doing…" />
      </Card>
    );
  if (care.isError) return <Notice tone="error">{care.error.message}</Notice>;
  const s = care.data;
  return (
    <Card className="space-y-6">
      <p className="text-sm text-ink-muted">
        Judged against the <strong>{s.profile.name}</strong> profile (version {s.profile.version}).
      </p>
      <ConcernList concerns={s.concerns} clubId={clubId} tankId={tankId} ownerId={ownerId} />
      <DueTests due={s.due} timeZone={timeZone} />
      <CycleTimeline cycle={s.cycle} typical={s.cycleTypical} phase={phase} />
      {phase === 'cycling' ? <CautionFor kind="fishlessCycling" title="Fishless cycling" /> : null}
      <ReadinessPanel readiness={s.readiness} clubId={clubId} tankId={tankId} ownerId={ownerId} />
      <CautionFor kind="medication" title="Medication" />
    </Card>
  );
}
