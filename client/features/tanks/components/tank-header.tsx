import { Link } from 'react-router';
import { SYSTEM_TYPE_LABELS } from '@shared/constants/tank-labels';
import type { PhotoView, TankDetailView } from '@shared/schemas/tank-views';
import { formatVolume, type UnitPrefs } from '@client/lib/display-units';
import { relativeTime } from '@client/lib/relative-time';
import { ArchivedBadge, PhaseBadge } from './badges';
import { TestTubeIcon } from '@client/components/ui/icons';

const dateFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'long', year: 'numeric' });
const linkButton = 'inline-flex min-h-touch items-center justify-center gap-2 rounded-full px-5 font-bold';

/** The tank's key facts and what can be done with it from here. */
export function TankHeader({ tank, prefs, profileName, photo, isOwn, canLog, canEdit }: { tank: TankDetailView; prefs: UnitPrefs; profileName: string | undefined; photo: PhotoView | undefined; isOwn: boolean; canLog: boolean; canEdit: boolean }) {
  const setUp = tank.setUpOn ? new Date(`${tank.setUpOn}T12:00:00`) : null;
  const animals = tank.livestock.filter((l) => !l.removedOn).reduce((n, l) => n + l.count, 0);
  return (
    <header className="mb-5 space-y-4">
      <Link to="/tanks" className="inline-flex min-h-touch items-center text-sm font-bold text-tide-700">← All tanks</Link>
      <div className="flex flex-wrap items-start gap-4">
        {photo ? <img src={photo.thumbUrl} alt={`Photo of ${tank.name}`} className="size-24 rounded-card object-cover shadow-card" /> : null}
        <div className="min-w-0 flex-1">
          <div className="flex flex-wrap items-center gap-2">
            <h1 className="text-2xl font-extrabold text-tide-900">{tank.name}</h1>
            <PhaseBadge phase={tank.phase} />
            {tank.archivedAt ? <ArchivedBadge /> : null}
          </div>
          <dl className="mt-2 grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:flex sm:flex-wrap">
            <div><dt className="inline font-bold text-tide-600">Kind: </dt><dd className="inline text-tide-900">{SYSTEM_TYPE_LABELS[tank.systemType]}</dd></div>
            <div><dt className="inline font-bold text-tide-600">Water: </dt><dd className="inline text-tide-900">{formatVolume(tank.volumeL, prefs)}{tank.volume.source === 'dimensions' ? ` (tank ${formatVolume(tank.volume.grossL, prefs)})` : ''}</dd></div>
            {setUp ? <div><dt className="inline font-bold text-tide-600">Set up: </dt><dd className="inline text-tide-900">{dateFormat.format(setUp)} ({relativeTime(setUp.toISOString())})</dd></div> : null}
            <div><dt className="inline font-bold text-tide-600">Animals: </dt><dd className="inline text-tide-900">{animals || 'none yet'}</dd></div>
            {profileName ? <div><dt className="inline font-bold text-tide-600">Profile: </dt><dd className="inline text-tide-900">{profileName}</dd></div> : null}
            {!isOwn ? <div><dt className="inline font-bold text-tide-600">Kept by: </dt><dd className="inline text-tide-900">{tank.owner.displayName}</dd></div> : null}
          </dl>
        </div>
      </div>
      {canLog || canEdit ? (
        <div className="flex flex-wrap gap-2">
          {canLog ? <Link to={`/tanks/${tank.id}/tests/new`} className={`${linkButton} grow bg-tide-700 text-white sm:grow-0`}><TestTubeIcon /> Log a water test</Link> : null}
          {canLog ? <Link to={`/tanks/${tank.id}/entries/new`} className={`${linkButton} grow bg-white text-tide-800 ring-1 ring-tide-200 sm:grow-0`}>Add a water change or note</Link> : null}
          {canEdit ? <Link to={`/tanks/${tank.id}/edit`} className={`${linkButton} text-tide-700 hover:bg-tide-50`}>Edit tank</Link> : null}
        </div>
      ) : null}
    </header>
  );
}
