import { useParams } from 'react-router';
import { asSubject } from '@shared/abilities';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Loading } from '@client/components/ui/skeleton';
import { useSession } from '@client/features/auth/components/session-provider';
import { useProfile } from '@client/lib/care-profiles';
import { formatDate } from '@client/lib/date-format';
import { ProfileRangesEditor } from '@client/features/care/components/profile-ranges-editor';

export function Component() {
  const { key = '' } = useParams();
  const { activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const detail = useProfile(clubId, key);
  if (detail.isPending) return <Loading label="Loading…" />;
  if (detail.isError) return <Notice tone="error">{detail.error.message}</Notice>;
  const d = detail.data;
  const editable = d.source === 'club' && ability.can('update', asSubject('CareProfile', { clubId }));
  return (
    <>
      <PageHeader
        title={d.profile.name}
        subtitle={
          d.source === 'club'
            ? `Club copy, version ${d.profile.version}, based on ${d.basedOnKey}`
            : 'Shipped with Shoalwise (make a club copy to adjust it)'
        }
      />
      <div className="space-y-4">
        <Card>
          {/* A fresh editor per version, so a save shows the new numbers as the starting point. */}
          <ProfileRangesEditor
            key={d.profile.version}
            clubId={clubId}
            profile={d.profile}
            id={d.id}
            editable={editable}
          />
        </Card>
        {d.history.length ? (
          <Card>
            <h2 className="text-lg font-extrabold text-ink">History</h2>
            <ol className="mt-2 space-y-3">
              {d.history.map((h) => (
                <li key={h.version}>
                  <p className="font-bold text-ink">
                    Version {h.version} · {formatDate(h.changedAt)}
                  </p>
                  <p className="text-sm text-ink-soft">{h.note}</p>
                  {h.changes.length ? (
                    <ul className="list-disc pl-5 text-sm text-ink-muted">
                      {h.changes.map((c) => (
                        <li key={c}>{c}</li>
                      ))}
                    </ul>
                  ) : null}
                </li>
              ))}
            </ol>
          </Card>
        ) : null}
      </div>
    </>
  );
}
