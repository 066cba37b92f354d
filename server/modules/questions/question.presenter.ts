import type { QuestionSummaryView, SnapshotSubject } from '@shared/schemas/question-views';
import type { QuestionStatus } from '@shared/schemas/question.schema';

/** One row of the summary query (question.queries.ts), as PostgreSQL hands it back. */
export interface SummaryRow {
  id: string;
  clubId: string;
  tankId: string;
  tankName: string;
  askerId: string;
  askerName: string;
  aboutKind: SnapshotSubject['kind'];
  aboutAt: string;
  title: string;
  status: QuestionStatus;
  createdAt: Date | string;
  answeredAt: Date | string | null;
  replyCount: number;
  lastActivityAt: Date | string;
  lastAuthorId: string;
}

const iso = (d: Date | string) => new Date(d).toISOString();

export function presentSummary(r: SummaryRow): QuestionSummaryView {
  return {
    id: r.id,
    clubId: r.clubId,
    tankId: r.tankId,
    tankName: r.tankName,
    asker: { userId: r.askerId, displayName: r.askerName },
    about: { kind: r.aboutKind, at: iso(r.aboutAt) },
    title: r.title,
    status: r.status,
    createdAt: iso(r.createdAt),
    answeredAt: r.answeredAt ? iso(r.answeredAt) : null,
    replyCount: Number(r.replyCount),
    lastActivityAt: iso(r.lastActivityAt),
    awaitingAnswer: r.status === 'open' && r.lastAuthorId === r.askerId,
  };
}
