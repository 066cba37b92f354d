import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Segmented } from '@client/components/ui/segmented';
import { useSession } from '@client/features/auth/components/session-provider';
import { questionKeys, type ListStatus } from '@client/features/questions/api/questions';
import { QuestionList } from '@client/features/questions/components/question-list';
import { QuestionRouteError } from '@client/features/questions/components/question-route-error';
import { useSocketEvent } from '@client/lib/socket';

const TABS: { value: ListStatus; label: string }[] = [
  { value: 'open', label: 'Open' },
  { value: 'all', label: 'All' },
];

export function Component() {
  const { activeClub } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const answers = activeClub?.role === 'mentor' || activeClub?.role === 'admin';
  const [status, setStatus] = useState<ListStatus>(answers ? 'open' : 'all');
  const qc = useQueryClient();
  useSocketEvent('tankChanged', (p) => {
    if (p.clubId === clubId) void qc.invalidateQueries({ queryKey: questionKeys.lists(clubId) });
  });
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;

  return (
    <>
      <PageHeader
        title={answers ? 'Questions' : 'My questions'}
        subtitle={
          answers
            ? 'What your mentees and the club’s keepers asked about their readings.'
            : 'Ask from any water test or observation on your tank’s page.'
        }
      />
      <Segmented
        label="Which questions"
        options={TABS}
        value={status}
        onChange={setStatus}
        inline
        className="mb-4"
      />
      <QuestionList
        clubId={clubId}
        status={status}
        showAsker={answers}
        empty={
          status === 'open'
            ? 'No open questions. When someone asks about a reading, it shows here.'
            : answers
              ? 'No questions yet.'
              : 'You have not asked anything yet. Open a tank and press “Ask about this” beside a test.'
        }
      />
    </>
  );
}

export const ErrorBoundary = QuestionRouteError;
