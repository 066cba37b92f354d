import { useState } from 'react';
import { Link } from 'react-router';
import { asSubject } from '@shared/abilities';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Loading } from '@client/components/ui/skeleton';
import { TextField } from '@client/components/ui/field';
import { SelectField } from '@client/components/ui/select';
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
      <PageHeader
        title="Care profiles"
        subtitle="The ranges each kind of tank is judged by. Shipped ones cite their sources; club copies can be adjusted."
      />
      {profiles.isPending ? (
        <Loading label="Loading…" />
      ) : profiles.isError ? (
        <Notice tone="error">{profiles.error.message}</Notice>
      ) : (
        <div className="space-y-4">
          <Card>
            <ul className="divide-y divide-line">
              {profiles.data.profiles.map((p) => (
                <li key={p.key} className="flex flex-wrap items-center justify-between gap-2 py-3">
                  <div>
                    <Link to={`/club/profiles/${p.key}`} className="font-bold text-ink underline">
                      {p.name}
                    </Link>
                    <p className="text-sm text-ink-muted">
                      {p.source === 'club' ? `Club copy, version ${p.version}` : 'Shipped with Shoalwise'} ·
                      for {p.animals}
                    </p>
                  </div>
                </li>
              ))}
            </ul>
          </Card>
          {canCopy ? (
            <Card>
              <h2 className="text-lg font-extrabold text-ink">Make a club copy</h2>
              <p className="text-sm text-ink-muted">
                Start from a profile and adjust its ranges for your club. Tanks keep following the original
                until their keeper picks the copy.
              </p>
              <div className="mt-3 grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
                <SelectField label="Start from" value={basedOn} onChange={(e) => setBasedOn(e.target.value)}>
                  <option value="">Choose…</option>
                  {profiles.data.profiles.map((p) => (
                    <option key={p.key} value={p.key}>
                      {p.name}
                    </option>
                  ))}
                </SelectField>
                <TextField label="Name of the copy" value={name} onChange={(e) => setName(e.target.value)} />
                <Button
                  busy={copy.isPending}
                  onClick={async () => {
                    setError(undefined);
                    try {
                      await copy.mutateAsync({ basedOn, name });
                      setName('');
                    } catch (e) {
                      setError(
                        e instanceof ApiError
                          ? [e.message, ...e.issues.map((i) => i.message)].join(' ')
                          : 'Could not copy.',
                      );
                    }
                  }}
                >
                  Copy
                </Button>
              </div>
              {error ? (
                <div className="mt-3">
                  <Notice tone="error">{error}</Notice>
                </div>
              ) : null}
            </Card>
          ) : null}
        </div>
      )}
    </>
  );
}
