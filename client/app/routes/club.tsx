import { Can } from '@casl/react';
import type { AppAbility } from '@shared/abilities';
import { Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { ButtonLink } from '@client/components/ui/button';
import { useSession } from '@client/features/auth/components/session-provider';
import { InvitePanel } from '@client/features/club/components/invite-panel';
import { MembersPanel } from '@client/features/club/components/members-panel';
import { MentorCapacityCard } from '@client/features/club/components/mentor-capacity-card';
import { MentorRequestsPanel } from '@client/features/club/components/mentor-requests-panel';
import { asSubject } from '@shared/abilities';

export function Component() {
  const { activeClub, ability, me } = useSession();
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  const isAdmin = ability.can('create', asSubject('Invite', { clubId: activeClub.clubId }));
  return (
    <>
      <PageHeader
        title={activeClub.clubName}
        subtitle={isAdmin ? 'Invite people, pair mentors with beginners.' : 'The people of your club.'}
        actions={
          <ButtonLink variant="secondary" to="/club/profiles">
            Care profiles
          </ButtonLink>
        }
      />
      <div className="space-y-5">
        <Can<AppAbility> I="create" this={asSubject('Invite', { clubId: activeClub.clubId })}>
          <InvitePanel clubId={activeClub.clubId} />
        </Can>
        <Can<AppAbility>
          I="update"
          this={asSubject('MentorRequest', { clubId: activeClub.clubId, requesterId: '' })}
        >
          <MentorRequestsPanel clubId={activeClub.clubId} />
        </Can>
        {activeClub.role !== 'member' ? (
          <MentorCapacityCard clubId={activeClub.clubId} userId={me.user.id} />
        ) : null}
        <MembersPanel clubId={activeClub.clubId} isAdmin={isAdmin} />
      </div>
    </>
  );
}
