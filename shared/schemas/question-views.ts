import type { AnyParameterKey } from '../care/parameters';
import type { Band } from '../care/profiles/types';
import type { Severity } from '../care/types';
import type { CanonicalValues } from '../readings/normalize-water-test';
import type { PersonRef } from './notification-views';
import type { QuestionStatus } from './question.schema';
import type { TankEventDetails } from './tank-event.schema';

/** What the question was about, copied when it was asked: later edits to the test do not change it. */
export type SnapshotSubject =
  | {
      kind: 'water-test';
      waterTestId: string;
      takenAt: string;
      values: CanonicalValues;
      freeAmmonia: number | null;
      note: string;
    }
  | {
      kind: 'observation';
      eventId: string;
      occurredAt: string;
      details: TankEventDetails<'observation'>;
      note: string;
    };

export interface SnapshotConcern {
  id: string;
  rule: string;
  parameter: AnyParameterKey | 'stocking';
  severity: Severity;
  reason: string;
  nextSteps: string[];
  value: number | null;
  unit: string | null;
  status: 'open' | 'acknowledged';
  raisedAt: string;
}

export interface QuestionSnapshot {
  takenAt: string;
  subject: SnapshotSubject;
  /** Concerns open (or acknowledged) on the tank when the question was asked. */
  concerns: SnapshotConcern[];
  profile: {
    key: string;
    version: number;
    name: string;
    animals: string;
    ranges: Partial<Record<AnyParameterKey, { ideal: Band; caution: Band }>>;
  } | null;
  tank: { name: string; systemType: string; phase: string; volumeL: number };
}

export interface QuestionSummaryView {
  id: string;
  clubId: string;
  tankId: string;
  tankName: string;
  asker: PersonRef;
  about: { kind: SnapshotSubject['kind']; at: string };
  title: string;
  status: QuestionStatus;
  createdAt: string;
  answeredAt: string | null;
  replyCount: number;
  lastActivityAt: string;
  /** Open and the last word is the asker's: someone should answer. */
  awaitingAnswer: boolean;
}

export interface ReplyView {
  id: string;
  author: PersonRef;
  body: string;
  createdAt: string;
}

/** One reading of the chart around the question's date (today's data, canonical units). */
export interface ChartReading {
  id: string;
  takenAt: string;
  values: CanonicalValues;
}

export interface QuestionDetailView {
  question: QuestionSummaryView & { body: string };
  snapshot: QuestionSnapshot;
  replies: ReplyView[];
  readings: ChartReading[];
  /** Mentors and admins of the club who may read this question: who a mention reaches. */
  mentionable: PersonRef[];
}
