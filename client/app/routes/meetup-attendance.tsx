import { useParams } from 'react-router';
import { Notice } from '@client/components/ui/card';
import { useSession } from '@client/features/auth/components/session-provider';
import { AttendanceHistory } from '@client/features/meetups/components/attendance-history';
import { MeetupRouteError } from '@client/features/meetups/components/meetup-route-error';

export function Component() {
  const { userId = '' } = useParams();
  const { me, activeClub } = useSession();
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  return <AttendanceHistory clubId={activeClub.clubId} userId={userId} isSelf={userId === me.user.id} />;
}

export const ErrorBoundary = MeetupRouteError;
