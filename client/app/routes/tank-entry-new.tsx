import { useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { useNavigate, useParams, useSearchParams } from 'react-router';
import { asSubject } from '../../../shared/abilities';
import { TANK_EVENT_KIND_LABELS } from '../../../shared/constants/tank-labels';
import type { TankEventView } from '../../../shared/schemas/tank-views';
import { Notice } from '../../components/ui/card';
import { PageHeader } from '../../components/ui/page-header';
import { Spinner } from '../../components/ui/spinner';
import { useSession } from '../../features/auth/components/session-provider';
import { careKeys } from '../../features/care/api/care';
import { useCreateTankEvent } from '../../features/tanks/api/events';
import { useUploadPhotos } from '../../features/tanks/api/photos';
import { useTank } from '../../features/tanks/api/tanks';
import { EventForm } from '../../features/tanks/components/events/event-form';
import { TankRouteError } from '../../features/tanks/components/tank-route-error';
import { newEventDraft, POSTED_KINDS, type PostedKind } from '../../features/tanks/lib/event-draft';
import { PhotoUploadError } from '../../features/tanks/lib/photo-upload-error';

const isPosted = (k: string | null): k is PostedKind => (POSTED_KINDS as readonly (string | null)[]).includes(k);

export function Component() {
  const { tankId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const tank = useTank(clubId, tankId);
  const create = useCreateTankEvent(clubId, tankId);
  const upload = useUploadPhotos(clubId);
  const navigate = useNavigate();
  const qc = useQueryClient();
  const saved = useRef<TankEventView | undefined>(undefined);
  const asked = params.get('kind');
  const kind: PostedKind = isPosted(asked) ? asked : 'water-change';
  // Made once: switching kinds later keeps what was typed in the others.
  const [initial] = useState(() => newEventDraft(kind, me.user));

  if (tank.isError) throw tank.error;
  if (tank.isPending) return <Spinner label="Loading the tank…" />;
  const t = tank.data;
  const allowed = !t.archivedAt && ability.can('create', asSubject('TankEvent', { clubId: t.clubId, ownerId: t.owner.id }));
  const finish = () => {
    void qc.invalidateQueries({ queryKey: careKeys.tank(tankId) });
    const label = saved.current ? TANK_EVENT_KIND_LABELS[saved.current.kind] : 'Entry';
    navigate(`/tanks/${tankId}`, { state: { saved: { message: `${label} saved. It is on the timeline.`, warnings: [] } } });
  };

  return (
    <>
      <PageHeader title="Add to the timeline" subtitle={t.name} />
      {allowed ? (
        <EventForm
          prefs={me.user}
          tankLitres={t.volumeL}
          livestock={t.livestock}
          initial={initial}
          onKindChange={(k) => setParams({ kind: k }, { replace: true })}
          onSkipPhotos={finish}
          onSave={async (input, photos) => {
            saved.current ??= await create.mutateAsync(input);
            if (photos.length) {
              try {
                await upload.mutateAsync({ tankId, files: photos, eventId: saved.current.id });
              } catch (error) {
                throw new PhotoUploadError(error);
              }
            }
            finish();
          }}
        />
      ) : (
        <Notice tone="warning">{t.archivedAt ? 'This tank is archived: restore it from the tank page to log new entries.' : 'Only the keeper of this tank can add entries to it.'}</Notice>
      )}
    </>
  );
}

export const ErrorBoundary = TankRouteError;
