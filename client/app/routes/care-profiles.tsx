import { useState } from 'react';
import { Link } from 'react-router';
import { asSubject } from '@shared/abilities';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Spinner } from '@client/components/ui/spinner';
import { useSession } from '@client/features/auth/components/session-provider';
import { useCopyProfile, useProfiles } from '@client/lib/care-profiles';
import { ApiError } from '@client/lib/api-client';

export function Component() {
  const { activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const profiles = useProfiles(clubId);
  const copy = useCopyProfile(clubId);
  const [basedOn, setBasedOn] = useState('');
  const [name, setName] = useState('');
  const [error, setError] = useState<string>();
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  const canCopy = ability.can('create', asSubject('CareProfile', { clubId }));
  return (
    <>
      <PageHeader title="Care profiles" subtitle="The ranges each kind of tank is judged by. Shipped ones cite their sources; club copies can be adjusted." />
      {profiles.isPending ? <Spinner /> : profiles.isError ? <Notice tone="error">{profiles.error.message}</Notice> : (
        <div className="space-y-4">
          <Card>
            <ul className="divide-y divide-tide-100">
              {profiles.data.profiles.map((p) => (
                <li key={p.key} className="flex flex-wrap items-center justify-between gap-2 py-3">
                  <div>
                    <Link to={`/club/profiles/${p.key}`} className="font-bold text-tide-900 underline">{p.name}</Link>
                    <p className="text-sm text-tide-600">{p.source === 'club' ? `Club copy, version ${p.version}` : 'Shipped with Shoalwise'} · for {p.animals}</p>
                  </div>
                </li>
              ))}
            </ul>
          </Card>
          {canCopy ? (
            <Card>
              <h2 className="text-lg font-extrabold text-tide-900">Make a club copy</h2>
              <p className="text-sm text-tide-700">Start from a profile and adjust its ranges for your club. Tanks keep following the original until their keeper picks the copy.</p>
              <div className="mt-3 grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
                <label className="text-sm font-bold text-tide-800">Start from
                  <select value={basedOn} onChange={(e) => setBasedOn(e.target.value)} className="mt-1 block min-h-touch w-full rounded-xl border border-tide-200 bg-white px-3 font-normal">
                    <option value="">Choose…</option>
                    {profiles.data.profiles.map((p) => <option key={p.key} value={p.key}>{p.name}</option>)}
                  </select>
                </label>
                <label className="text-sm font-bold text-tide-800">Name of the copy
                  <input value={name} onChange={(e) => setName(e.target.value)} className="mt-1 block min-h-touch w-full rounded-xl border border-tide-200 px-3 font-normal" />
                </label>
                <Button busy={copy.isPending} onClick={async () => {
                  setError(undefined);
                  try {
                    await copy.mutateAsync({ basedOn, name });
                    setName('');
                  } catch (e) {
                    setError(e instanceof ApiError ? [e.message, ...e.issues.map((i) => i.message)].join(' ') : 'Could not copy.');
                  }
                }}>Copy</Button>
              </div>
              {error ? <div className="mt-3"><Notice tone="error">{error}</Notice></div> : null}
            </Card>
          ) : null}
        </div>
      )}
    </>
  );
}
