import { useQuery, useQueryClient } from '@tanstack/react-query';
import { Link } from 'react-router';
import { asSubject } from '@shared/abilities';
import { HOME_DESK_TANKS_MAX } from '@shared/constants/home';
import { ROLE_LABELS } from '@shared/constants/roles';
import type { HomeQuestion } from '@shared/schemas/home-views';
import { Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { useSession } from '@client/features/auth/components/session-provider';
import { useInvites } from '@client/features/club/api/club';
import { openRequestsQuery } from '@client/features/club/api/mentor-requests';
import { AskForMentorCard } from '@client/features/club/components/ask-for-mentor-card';
import { deskKeys, deskQuery, type DeskFilters } from '@client/features/desk/api/desk';
import { homeKeys, useHome, useLiveHome } from '@client/features/home/api/home';
import { FirstTankStart } from '@client/features/home/components/first-tank-start';
import { HomeSkeleton } from '@client/features/home/components/home-skeleton';
import { MentorWork } from '@client/features/home/components/mentor-work';
import { MentorWord } from '@client/features/home/components/mentor-word';
import { TodayTankCard } from '@client/features/home/components/today-tank-card';
import { useMinuteClock } from '@client/features/home/lib/today';
import { useMarkRead } from '@client/features/notifications/api/notifications';

const WHOLE_DESK: DeskFilters = { urgentOnly: false, cycling: false, unanswered: false };

/**
 * Home: what to do today. A member's tanks with the tests due and one action each, their questions and their
 * mentor's good news; a mentor's or admin's work first. Kept live over the socket like the desk.
 */
export function Component() {
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const role = activeClub?.role ?? 'member';
  const isAdmin = role === 'admin';
  const watchesOthers = role !== 'member';
  const qc = useQueryClient();
  const now = useMinuteClock();

  const home = useHome(clubId);
  const desk = useQuery({ ...deskQuery(clubId, WHOLE_DESK), enabled: Boolean(activeClub) && watchesOthers });
  const requests = useQuery({ ...openRequestsQuery(clubId), enabled: Boolean(activeClub) && isAdmin });
  const invites = useInvites(clubId, Boolean(activeClub) && isAdmin);
  useLiveHome(clubId, () => {
    if (watchesOthers) void qc.invalidateQueries({ queryKey: deskKeys.all(clubId) });
  });
  const markRead = useMarkRead();
  const openQuestion = (q: HomeQuestion) => {
    for (const id of q.unreadNotificationIds)
      markRead.mutate(id, {
        onSettled: () => void qc.invalidateQueries({ queryKey: homeKeys.club(clubId) }),
      });
  };

  const first = me.user.displayName.split(' ')[0];
  const header = (
    <PageHeader
      title={`Hello, ${first}`}
      subtitle={activeClub ? `${activeClub.clubName} · ${ROLE_LABELS[activeClub.role]}` : undefined}
    />
  );
  if (!activeClub) {
    return (
      <>
        {header}
        <Notice tone="warning">
          You are not an active member of any club right now. Ask a club admin for an invitation.
        </Notice>
      </>
    );
  }

  const canCreate = ability.can('create', asSubject('Tank', { clubId, ownerId: me.user.id }));
  const tanks = home.data?.tanks ?? [];
  const work = watchesOthers ? (
    <MentorWork
      wholeClub={isAdmin}
      deskMax={HOME_DESK_TANKS_MAX}
      desk={{ data: desk.data, error: desk.error?.message }}
      requests={
        isAdmin
          ? {
              data: requests.data && {
                open: requests.data.requests.map((r) => ({
                  id: r.id,
                  name: r.requester.displayName,
                  at: r.createdAt,
                })),
              },
              error: requests.error?.message,
            }
          : undefined
      }
      invites={
        isAdmin
          ? {
              data: invites.data && {
                waiting: invites.data.invites.filter((i) => i.state === 'pending').length,
                expired: invites.data.invites.filter((i) => i.state === 'expired').length,
              },
              error: invites.error?.message,
            }
          : undefined
      }
    />
  ) : null;

  return (
    <>
      {header}
      <div className="space-y-5">
        {work}
        <section aria-labelledby="today-heading">
          <div className="mb-2 flex items-baseline justify-between gap-2">
            <h2
              id="today-heading"
              className={`text-xl font-extrabold text-ink ${home.data && !tanks.length && !watchesOthers ? 'sr-only' : ''}`}
            >
              {watchesOthers ? 'Your own tanks' : 'Your tanks today'}
            </h2>
            {tanks.length ? (
              <Link to="/tanks" className="text-sm font-bold text-link underline">
                All my tanks
              </Link>
            ) : null}
          </div>
          {home.isPending ? (
            <HomeSkeleton />
          ) : home.isError ? (
            <Notice tone="error">Could not load your tanks: {home.error.message}</Notice>
          ) : tanks.length ? (
            <ul className="space-y-4" aria-label="Your tanks">
              {tanks.map((t) => (
                <TodayTankCard key={t.id} tank={t} now={now} timeZone={me.user.timeZone} prefs={me.user} />
              ))}
            </ul>
          ) : watchesOthers ? (
            <p className="text-sm text-ink-muted">
              You keep no tank in this club yet.
              {canCreate ? (
                <>
                  {' '}
                  <Link to="/tanks/new" className="font-bold underline">
                    Add one
                  </Link>{' '}
                  to log its tests here.
                </>
              ) : null}
            </p>
          ) : (
            <FirstTankStart canCreate={canCreate} />
          )}
        </section>
        {home.data && (home.data.questions.length || home.data.goodNews.length || tanks.length) ? (
          <MentorWord
            questions={home.data.questions}
            goodNews={home.data.goodNews}
            onOpenQuestion={openQuestion}
          />
        ) : null}
        {role === 'member' ? <AskForMentorCard key={clubId} clubId={clubId} userId={me.user.id} /> : null}
      </div>
    </>
  );
}
