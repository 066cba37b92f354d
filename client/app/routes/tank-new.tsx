import { useMemo, useRef } from 'react';
import { useNavigate } from 'react-router';
import { asSubject } from '../../../shared/abilities';
import { defaultProfileFor } from '../../../shared/care/profiles';
import { SYSTEM_TYPES } from '../../../shared/care/system-types';
import type { TankDetailView } from '../../../shared/schemas/tank-views';
import { Card, Notice } from '../../components/ui/card';
import { PageHeader } from '../../components/ui/page-header';
import { useSession } from '../../features/auth/components/session-provider';
import { useUploadPhotos } from '../../features/tanks/api/photos';
import { useCreateTank } from '../../features/tanks/api/tanks';
import { TankForm } from '../../features/tanks/components/tank-form/tank-form';
import { TankRouteError } from '../../features/tanks/components/tank-route-error';
import { PhotoUploadError } from '../../features/tanks/lib/photo-upload-error';
import { newTankDraft } from '../../features/tanks/lib/tank-draft';

export function Component() {
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const create = useCreateTank(clubId);
  const navigate = useNavigate();
  const created = useRef<TankDetailView | undefined>(undefined);
  const upload = useUploadPhotos(clubId);
  const initial = useMemo(() => newTankDraft(me.user, SYSTEM_TYPES[0], defaultProfileFor(SYSTEM_TYPES[0]).key), [me.user]);
  if (!activeClub || !ability.can('create', asSubject('Tank', { clubId, ownerId: me.user.id }))) {
    return <Notice tone="warning">You need to be an active member of a club to add a tank.</Notice>;
  }
  const open = () => navigate(`/tanks/${created.current!.id}`, { replace: true, state: { saved: { message: 'Tank added. Log your first water test whenever you are ready.', warnings: [] } } });
  return (
    <>
      <PageHeader title="Add a tank" subtitle="You can change all of this later." />
      <Card>
        <TankForm
          clubId={clubId}
          prefs={me.user}
          initial={initial}
          submitLabel="Add the tank"
          onSkipPhotos={open}
          onSave={async (input, photos) => {
            created.current ??= await create.mutateAsync(input);
            if (photos.length) {
              try {
                await upload.mutateAsync({ files: photos, tankId: created.current.id });
              } catch (error) {
                throw new PhotoUploadError(error);
              }
            }
            open();
          }}
        />
      </Card>
    </>
  );
}

export const ErrorBoundary = TankRouteError;
