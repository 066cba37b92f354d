import { useQueryClient } from '@tanstack/react-query';
import { lazy, Suspense } from 'react';
import { useParams } from 'react-router';
import { asSubject } from '@shared/abilities';
import { Button, ButtonLink } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Loading, PageSkeleton } from '@client/components/ui/skeleton';
import { useSession } from '@client/features/auth/components/session-provider';
import { questionKeys, useMarkAnswered, useQuestion } from '@client/features/questions/api/questions';
import {
  QuestionLoadError,
  QuestionRouteError,
} from '@client/features/questions/components/question-route-error';
import { ReplyBox } from '@client/features/questions/components/reply-box';
import { SnapshotPanel } from '@client/features/questions/components/snapshot-panel';
import { Thread } from '@client/features/questions/components/thread';
import { useSocketEvent, useSocketReconnect } from '@client/lib/socket';

// The chart library is the heaviest part of the page: the thread and figures show first.
const ReadingsChart = lazy(() =>
  import('@client/features/questions/components/readings-chart').then((m) => ({ default: m.ReadingsChart })),
);

export function Component() {
  const { questionId = '' } = useParams();
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const detail = useQuestion(clubId, questionId);
  const mark = useMarkAnswered(clubId, questionId);
  const qc = useQueryClient();
  const refresh = () => void qc.invalidateQueries({ queryKey: questionKeys.detail(clubId, questionId) });
  // A reply by someone else touches the tank's watchers (and notifies the asker): either way, fetch the thread again.
  useSocketEvent('tankChanged', (p) => {
    if (p.tankId === detail.data?.question.tankId) refresh();
  });
  useSocketEvent('notification', ({ notification }) => {
    if (notification.subject?.id === questionId) refresh();
  });
  useSocketReconnect(refresh);

  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  if (detail.isError) return <QuestionLoadError error={detail.error} />;
  if (detail.isPending) return <PageSkeleton label="Loading the question…" />;
  const d = detail.data;
  const q = d.question;
  const subject = asSubject('Question', { clubId: q.clubId, askerId: q.asker.userId });
  const isAsker = ability.can('update', subject);
  const canReply = isAsker || ability.can('answer', subject);

  return (
    <>
      <PageHeader
        title={q.title}
        subtitle={`${q.asker.userId === me.user.id ? 'You' : q.asker.displayName} asked about ${q.tankName}`}
        actions={
          <ButtonLink variant="secondary" to={`/tanks/${q.tankId}`}>
            Open the tank
          </ButtonLink>
        }
      />
      <div className="mb-4 flex flex-wrap items-center gap-3">
        {q.status === 'answered' ? (
          <span className="rounded-full bg-ok-soft px-3 py-1 text-sm font-extrabold text-ok">✓ Answered</span>
        ) : q.awaitingAnswer ? (
          <span className="rounded-full bg-watch-soft px-3 py-1 text-sm font-extrabold text-watch">
            ● Waiting for an answer
          </span>
        ) : (
          <span className="rounded-full bg-tint px-3 py-1 text-sm font-extrabold text-ink-muted">
            ↩ Replied: over to {isAsker ? 'you' : q.asker.displayName}
          </span>
        )}
        {isAsker ? (
          <Button
            variant={q.status === 'answered' ? 'secondary' : 'primary'}
            busy={mark.isPending}
            onClick={() => mark.mutate(q.status !== 'answered')}
          >
            {q.status === 'answered' ? 'Reopen the question' : 'Mark answered'}
          </Button>
        ) : null}
      </div>
      {mark.isError ? (
        <div className="mb-4">
          <Notice tone="error">{mark.error.message}</Notice>
        </div>
      ) : null}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,24rem)]">
        <div className="space-y-4 lg:order-2">
          <SnapshotPanel snapshot={d.snapshot} prefs={me.user} />
          <Suspense
            fallback={
              <Card>
                <Loading label="Drawing the chart…" />
              </Card>
            }
          >
            <ReadingsChart readings={d.readings} snapshot={d.snapshot} prefs={me.user} />
          </Suspense>
        </div>
        <section aria-label="Conversation" className="space-y-4 lg:order-1">
          <Thread detail={d} />
          {canReply ? (
            <Card>
              <ReplyBox
                key={questionId}
                clubId={clubId}
                questionId={questionId}
                mentionable={d.mentionable}
              />
            </Card>
          ) : (
            <Notice tone="info">
              You can read this question but no longer reply: the mentoring has ended.
            </Notice>
          )}
        </section>
      </div>
    </>
  );
}

export const ErrorBoundary = QuestionRouteError;
