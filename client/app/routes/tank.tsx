import type { ReactNode } from 'react';
import { useLocation } from 'react-router';
import { asSubject } from '@shared/abilities';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { TankCarePanel } from '@client/features/care/components/tank-care-panel';
import { TankRecords } from '@client/features/import/components/tank-records';
import { AskAboutRecent } from '@client/features/questions/components/ask-about-recent';
import { TankHistory } from '@client/features/readings/components/history/tank-history';
import { Timeline } from '@client/features/readings/components/history/timeline';
import { useSetArchived } from '@client/features/tanks/api/tanks';
import { LivestockPanel } from '@client/features/tanks/components/livestock/livestock-panel';
import { TankHeader } from '@client/features/tanks/components/tank-header';
import { TankLoadError, TankRouteError } from '@client/features/tanks/components/tank-route-error';
import { useProfile } from '@client/lib/care-profiles';
import { useTankPhotos } from '@client/lib/photos';
import type { SavedNotice } from '@client/lib/saved-notice';
import { useTankRoute } from '../use-tank-route';

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section aria-label={title}>
      <h2 className="mb-3 text-xl font-extrabold text-ink">{title}</h2>
      {children}
    </section>
  );
}

export function Component() {
  const { me, ability, clubId, tankId, tank, mayLog } = useTankRoute();
  const profile = useProfile(clubId, tank.data?.careProfileKey).data?.profile;
  const photos = useTankPhotos(clubId, tankId, tank.isSuccess);
  const restore = useSetArchived(clubId, tankId);
  const saved = (useLocation().state as { saved?: SavedNotice } | null)?.saved;

  if (tank.isError) return <TankLoadError error={tank.error} />;
  if (tank.isPending) return <PageSkeleton label="Loading the tank…" />;
  const t = tank.data;
  const subject = asSubject('Tank', { clubId: t.clubId, ownerId: t.owner.id });
  const active = !t.archivedAt;
  const canEdit = mayLog('update', 'Tank');
  const canLog = mayLog('create', 'WaterTest');
  const tankPhoto = photos.data?.find((p) => !p.waterTestId && !p.eventId);

  return (
    <>
      <TankHeader
        tank={t}
        prefs={me.user}
        profileName={profile?.name}
        photo={tankPhoto}
        isOwn={t.owner.id === me.user.id}
        canLog={canLog}
        canEdit={canEdit}
      />
      <div className="space-y-8">
        {saved ? (
          <Notice tone={saved.warnings.length ? 'warning' : 'success'}>
            {saved.message}
            {saved.toCharts ? (
              <>
                {' '}
                <a href="#readings-heading" className="font-bold underline">
                  Go to the charts
                </a>
              </>
            ) : null}
            {saved.warnings.length ? (
              <ul className="mt-1 list-disc pl-5">
                {saved.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            ) : null}
          </Notice>
        ) : null}
        {!active ? (
          <Notice tone="info">
            This tank is archived: its history stays, but nothing new can be logged.{' '}
            {ability.can('update', subject) ? (
              <Button
                variant="secondary"
                className="ml-2"
                busy={restore.isPending}
                onClick={() => restore.mutate(false)}
              >
                Restore it
              </Button>
            ) : null}
          </Notice>
        ) : null}
        <TankCarePanel
          clubId={clubId}
          tankId={t.id}
          ownerId={t.owner.id}
          phase={t.phase}
          timeZone={me.user.timeZone}
        />
        <TankHistory
          clubId={clubId}
          tankId={t.id}
          profile={profile}
          prefs={me.user}
          cycling={t.phase === 'cycling'}
          editable={canLog}
        />
        <Section title={t.owner.id === me.user.id ? 'Ask your mentor' : 'Questions'}>
          <Card>
            <AskAboutRecent
              clubId={clubId}
              tankId={t.id}
              ownerId={t.owner.id}
              prefs={me.user}
              canAsk={
                active &&
                ability.can('create', asSubject('Question', { clubId: t.clubId, askerId: t.owner.id }))
              }
            />
          </Card>
        </Section>
        <Section title="Timeline">
          <Card>
            <Timeline clubId={clubId} tankId={t.id} profile={profile} prefs={me.user} editable={canLog} />
          </Card>
        </Section>
        <Section title="Animals">
          <Card>
            <LivestockPanel clubId={clubId} tankId={t.id} livestock={t.livestock} editable={canEdit} />
          </Card>
        </Section>
        <Section title="Records">
          <Card>
            <TankRecords clubId={clubId} tankId={t.id} canImport={canLog} />
          </Card>
        </Section>
      </div>
    </>
  );
}

export const ErrorBoundary = TankRouteError;
