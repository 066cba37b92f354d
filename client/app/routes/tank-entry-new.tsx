import { useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router';
import { Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { EventForm } from '@client/features/readings/components/events/event-form';
import { newEventDraft, POSTED_KINDS, type PostedKind } from '@client/features/readings/lib/event-draft';
import { TankLoadError, TankRouteError } from '@client/features/tanks/components/tank-route-error';
import { useTankRoute } from '../use-tank-route';

const isPosted = (k: string | null): k is PostedKind =>
  (POSTED_KINDS as readonly (string | null)[]).includes(k);

export function Component() {
  const [params, setParams] = useSearchParams();
  const { me, clubId, tankId, tank, mayLog } = useTankRoute();
  const navigate = useNavigate();
  const asked = params.get('kind');
  const kind: PostedKind = isPosted(asked) ? asked : 'water-change';
  // Made once: switching kinds later keeps what was typed in the others.
  const [initial] = useState(() => newEventDraft(kind, me.user));

  if (tank.isError) return <TankLoadError error={tank.error} />;
  if (tank.isPending) return <PageSkeleton label="Loading the tank…" />;
  const t = tank.data;
  const allowed = mayLog('create', 'TankEvent');

  return (
    <>
      <PageHeader title="Add to the timeline" subtitle={t.name} />
      {allowed ? (
        <EventForm
          clubId={clubId}
          tankId={tankId}
          prefs={me.user}
          tankLitres={t.volumeL}
          livestock={t.livestock}
          initial={initial}
          onKindChange={(k) => setParams({ kind: k }, { replace: true })}
          onSaved={(saved) => navigate(`/tanks/${tankId}`, { state: { saved } })}
        />
      ) : (
        <Notice tone="warning">
          {t.archivedAt
            ? 'This tank is archived: restore it from the tank page to log new entries.'
            : 'Only the keeper of this tank can add entries to it.'}
        </Notice>
      )}
    </>
  );
}

export const ErrorBoundary = TankRouteError;
