import { useSearchParams } from 'react-router';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { useTankList } from '../../api/tanks';
import type { UnitPrefs } from '@client/lib/display-units';
import { FishIcon } from '@client/components/ui/icons';
import { ButtonLink } from '@client/components/ui/button';
import { TankCard, TankListSkeleton } from './tank-card';

function Toggle({
  label,
  checked,
  onChange,
}: {
  label: string;
  checked: boolean;
  onChange: (v: boolean) => void;
}) {
  return (
    <label className="inline-flex min-h-touch cursor-pointer items-center gap-2 rounded-full bg-surface px-4 text-sm font-bold text-ink-soft ring-1 ring-line-strong">
      <input
        type="checkbox"
        className="size-5 accent-accent"
        checked={checked}
        onChange={(e) => onChange(e.target.checked)}
      />
      {label}
    </label>
  );
}

function EmptyState({ canCreate, others }: { canCreate: boolean; others: boolean }) {
  return (
    <Card className="text-center">
      <span className="inline-grid size-14 place-items-center rounded-full bg-tint text-ink-muted [&>svg]:size-8">
        <FishIcon />
      </span>
      <h2 className="mt-2 text-xl font-extrabold text-ink">No tanks yet</h2>
      <p className="mx-auto mt-1 max-w-md text-ink-muted">
        {others
          ? 'When the members you mentor add their tanks, they will show up here.'
          : 'Add your first tank: its size, what will live in it and whether it is still cycling. Then log your water tests here, and your mentor can follow along.'}
      </p>
      {canCreate ? (
        <ButtonLink to="/tanks/new" className="mt-4">
          Add my first tank
        </ButtonLink>
      ) : null}
    </Card>
  );
}

/** The tanks a member keeps — or, for mentors and admins, every tank they may read, with whose it is. */
export function TankList({
  clubId,
  clubName,
  userId,
  prefs,
  oversees,
  canCreate,
}: {
  clubId: string;
  clubName: string;
  userId: string;
  prefs: UnitPrefs;
  oversees: boolean;
  canCreate: boolean;
}) {
  const [params, setParams] = useSearchParams();
  const mine = !oversees || params.get('mine') === '1';
  const includeArchived = params.get('archived') === '1';
  const tanks = useTankList(clubId, { mine, includeArchived });
  const set = (key: string, on: boolean) =>
    setParams(
      (p) => {
        const next = new URLSearchParams(p);
        if (on) next.set(key, '1');
        else next.delete(key);
        return next;
      },
      { replace: true },
    );

  const list = tanks.data?.tanks ?? [];
  return (
    <>
      <PageHeader
        title={oversees && !mine ? 'Tanks' : 'My tanks'}
        subtitle={
          oversees && !mine
            ? `Tanks in ${clubName} you can follow.`
            : 'Your tanks and how long since each was tested.'
        }
        actions={canCreate && list.length ? <ButtonLink to="/tanks/new">Add a tank</ButtonLink> : undefined}
      />
      <div className="mb-4 flex flex-wrap gap-2">
        {oversees ? (
          <Toggle label="Only my own tanks" checked={mine} onChange={(v) => set('mine', v)} />
        ) : null}
        <Toggle label="Show archived tanks" checked={includeArchived} onChange={(v) => set('archived', v)} />
      </div>
      {tanks.isPending ? (
        <TankListSkeleton />
      ) : tanks.isError ? (
        <Notice tone="error">
          {tanks.error.message}{' '}
          <button type="button" className="underline" onClick={() => void tanks.refetch()}>
            Try again
          </button>
        </Notice>
      ) : list.length === 0 ? (
        <EmptyState canCreate={canCreate} others={oversees && !mine} />
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2">
          {list.map((t) => (
            <TankCard key={t.id} tank={t} prefs={prefs} showOwner={t.owner.id !== userId} />
          ))}
        </ul>
      )}
    </>
  );
}
