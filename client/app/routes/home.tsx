import { ROLE_LABELS } from '@shared/constants/roles';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { useSession } from '@client/features/auth/components/session-provider';
import { AskForMentorCard } from '@client/features/club/components/ask-for-mentor-card';

export function Component() {
  const { me, activeClub } = useSession();
  const first = me.user.displayName.split(' ')[0];
  return (
    <>
      <PageHeader title={`Hello, ${first}`} subtitle={activeClub ? `${activeClub.clubName} · ${ROLE_LABELS[activeClub.role]}` : undefined} />
      {!activeClub ? (
        <Notice tone="warning">You are not an active member of any club right now. Ask a club admin for an invitation.</Notice>
      ) : (
        <div className="space-y-5">
          <Card>
            <p className="text-ink-soft">
              Log your water tests, watch your tank through the nitrogen cycle, and let your mentor spot trouble early.
            </p>
          </Card>
          <AskForMentorCard key={activeClub.clubId} clubId={activeClub.clubId} userId={me.user.id} />
        </div>
      )}
    </>
  );
}
