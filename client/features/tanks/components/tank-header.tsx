import { Link } from 'react-router';
import { SYSTEM_TYPE_LABELS } from '@shared/constants/tank-labels';
import type { PhotoView, TankDetailView } from '@shared/schemas/tank-views';
import { formatVolume, type UnitPrefs } from '@client/lib/display-units';
import { ArchivedBadge, PhaseBadge } from './badges';
import { TestTubeIcon } from '@client/components/ui/icons';
import { PageTitle } from '@client/components/ui/page-title';
import { ButtonLink } from '@client/components/ui/button';
import { RelativeTime } from '@client/components/ui/relative-time';

const dateFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'long', year: 'numeric' });

/** The tank's key facts and what can be done with it from here. */
export function TankHeader({
  tank,
  prefs,
  profileName,
  photo,
  isOwn,
  canLog,
  canEdit,
}: {
  tank: TankDetailView;
  prefs: UnitPrefs;
  profileName: string | undefined;
  photo: PhotoView | undefined;
  isOwn: boolean;
  canLog: boolean;
  canEdit: boolean;
}) {
  const setUp = tank.setUpOn ? new Date(`${tank.setUpOn}T12:00:00`) : null;
  const animals = tank.livestock.filter((l) => !l.removedOn).reduce((n, l) => n + l.count, 0);
  return (
    <header className="mb-5 space-y-4">
      <Link to="/tanks" className="inline-flex min-h-touch items-center text-sm font-bold text-ink-muted">
        ← All tanks
      </Link>
      <div className="flex flex-wrap items-start gap-4">
        {photo ? (
          <img
            src={photo.thumbUrl}
            alt={`Photo of ${tank.name}`}
            className="size-24 rounded-card object-cover shadow-card"
          />
        ) : null}
        <div className="min-w-0 flex-1">
          <div className="flex flex-wrap items-center gap-2">
            <PageTitle title={tank.name} />
            <h1 className="text-2xl font-extrabold text-ink">{tank.name}</h1>
            <PhaseBadge phase={tank.phase} />
            {tank.archivedAt ? <ArchivedBadge /> : null}
          </div>
          <dl className="mt-2 grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:flex sm:flex-wrap">
            <div>
              <dt className="inline font-bold text-ink-muted">Kind: </dt>
              <dd className="inline text-ink">{SYSTEM_TYPE_LABELS[tank.systemType]}</dd>
            </div>
            <div>
              <dt className="inline font-bold text-ink-muted">Water: </dt>
              <dd className="inline text-ink">
                {formatVolume(tank.volumeL, prefs)}
                {tank.volume.source === 'dimensions'
                  ? ` (tank ${formatVolume(tank.volume.grossL, prefs)})`
                  : ''}
              </dd>
            </div>
            {setUp ? (
              <div>
                <dt className="inline font-bold text-ink-muted">Set up: </dt>
                <dd className="inline text-ink">
                  {dateFormat.format(setUp)} (<RelativeTime at={setUp} />)
                </dd>
              </div>
            ) : null}
            <div>
              <dt className="inline font-bold text-ink-muted">Animals: </dt>
              <dd className="inline text-ink">{animals || 'none yet'}</dd>
            </div>
            {profileName ? (
              <div>
                <dt className="inline font-bold text-ink-muted">Profile: </dt>
                <dd className="inline text-ink">{profileName}</dd>
              </div>
            ) : null}
            {!isOwn ? (
              <div>
                <dt className="inline font-bold text-ink-muted">Kept by: </dt>
                <dd className="inline text-ink">{tank.owner.displayName}</dd>
              </div>
            ) : null}
          </dl>
        </div>
      </div>
      {canLog || canEdit ? (
        <div className="flex flex-wrap gap-2">
          {canLog ? (
            <ButtonLink to={`/tanks/${tank.id}/tests/new`} className="grow sm:grow-0">
              <TestTubeIcon /> Log a water test
            </ButtonLink>
          ) : null}
          {canLog ? (
            <ButtonLink variant="secondary" to={`/tanks/${tank.id}/entries/new`} className="grow sm:grow-0">
              Add a water change or note
            </ButtonLink>
          ) : null}
          {canEdit ? (
            <ButtonLink variant="ghost" to={`/tanks/${tank.id}/edit`}>
              Edit tank
            </ButtonLink>
          ) : null}
        </div>
      ) : null}
    </header>
  );
}
