import type { AnyParameterKey } from '../care/parameters';
import type { CycleStage } from '../care/cycle-constants';
import type { DueTest } from '../care/due-tests';
import type { SystemType } from '../care/system-types';
import type { Severity, TankPhase } from '../care/types';
import type { CanonicalValues } from '../readings/normalize-water-test';
import type { PersonRef } from './notification-views';
import type { QuestionStatus } from './question.schema';

/** One of the viewer's own tanks as the home shows it: its state in words, its worst concern, what to test. */
export interface HomeTank {
  id: string;
  name: string;
  systemType: SystemType;
  phase: TankPhase;
  cycleStage: CycleStage;
  hasLivestock: boolean;
  /** The most serious concern still open or acknowledged; null when nothing is wrong. */
  worstConcern: {
    id: string;
    severity: Severity;
    parameter: AnyParameterKey | 'stocking';
    reason: string;
    raisedAt: string;
  } | null;
  liveConcerns: number;
  /** Every test the tank's profile schedules in its phase (`dueTests`); the page groups them by the member's calendar. */
  due: DueTest[];
  lastTest: { id: string; takenAt: string; values: CanonicalValues } | null;
}

/** One of the viewer's own questions: open, or with a reply they have not read yet. */
export interface HomeQuestion {
  id: string;
  tankId: string;
  tankName: string;
  title: string;
  status: QuestionStatus;
  lastActivityAt: string;
  /** The newest reply, shortened; null while nobody has replied. */
  lastReply: { author: PersonRef; excerpt: string; at: string } | null;
  /** The viewer's unread notifications about this question: the home marks them read when it is opened. */
  unreadNotificationIds: string[];
}

/** Something a mentor did that is worth a smile: signing a tank off for animals, or resolving a concern. */
export type HomeGoodNews =
  | { kind: 'signed-off'; tankId: string; tankName: string; by: PersonRef; at: string; note: string }
  | {
      kind: 'concern-resolved';
      tankId: string;
      tankName: string;
      by: PersonRef;
      at: string;
      note: string;
      parameter: AnyParameterKey | 'stocking';
      reason: string;
    };

export interface HomeView {
  generatedAt: string;
  tanks: HomeTank[];
  questions: HomeQuestion[];
  /** From the last GOOD_NEWS_DAYS days, newest first. */
  goodNews: HomeGoodNews[];
}
