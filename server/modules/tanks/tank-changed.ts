import type { EntityManager } from 'typeorm';
import type { Severity } from '@shared/care';
import { liveTankIdsOnProfile, tankRef, type TankRef } from './tank.queries';

/** Why a tank changed. */
export type TankChangeCause =
  | 'water-tests'
  | 'livestock'
  | 'settings'
  | 'care-profile'
  | 'sign-off'
  /** A person acknowledged or resolved one of its concerns. */
  | 'concern'
  /** A question about it was asked, answered or reopened. */
  | 'question';

/** What changes the meaning of the tank's readings: its concerns are judged again. The rest is only announced. */
const REJUDGED: ReadonlySet<TankChangeCause> = new Set([
  'water-tests',
  'livestock',
  'settings',
  'care-profile',
  'sign-off',
]);

export interface TankChange {
  tank: TankRef;
  cause: TankChangeCause;
}

export interface JudgedConcern {
  id: string;
  severity: Severity;
  reason: string;
  nextSteps: string[];
}

/** What judging the tank again found. */
export interface TankVerdict {
  raised: number;
  cleared: number;
  /** Urgent and caution concerns raised or worsened by this change and not acknowledged: what a mentor should hear of. */
  needsAttention: readonly JudgedConcern[];
}

export const NOTHING_NEW: TankVerdict = Object.freeze({ raised: 0, cleared: 0, needsAttention: [] });

/** Brings the tank's concerns in line with its readings, inside the transaction of the change. */
export type TankJudge = (tx: EntityManager, tank: TankRef) => Promise<TankVerdict>;
/** Hears every change with its verdict, still inside the transaction (work for after the commit goes through afterCommit). */
export type TankChangeListener = (
  tx: EntityManager,
  change: TankChange,
  verdict: TankVerdict,
) => Promise<void>;

/**
 * The one way a change to a tank is made known: whoever changes a tank (its readings, animals, settings, care
 * profile, sign-off, a concern or a question on it) publishes here inside its transaction. The judge (concerns)
 * re-judges the tank when the cause calls for it; then every listener (notifications, live updates) hears of it.
 * Built once per app in server/app.ts and handed to routers and services in the deps object.
 */
export class TankChanges {
  private readonly listeners: TankChangeListener[] = [];

  constructor(private readonly judge: TankJudge) {}

  listen(listener: TankChangeListener): this {
    this.listeners.push(listener);
    return this;
  }

  async publish(tx: EntityManager, tankId: string, cause: TankChangeCause): Promise<TankVerdict> {
    const tank = await tankRef(tx, tankId);
    if (!tank) return NOTHING_NEW;
    const verdict = REJUDGED.has(cause) ? await this.judge(tx, tank) : NOTHING_NEW;
    for (const listener of this.listeners) await listener(tx, { tank, cause }, verdict);
    return verdict;
  }

  /** A club's care profile changed: every live tank that follows it is judged by the new version. */
  async publishForProfile(tx: EntityManager, clubId: string, careProfileKey: string): Promise<void> {
    for (const id of await liveTankIdsOnProfile(tx, clubId, careProfileKey))
      await this.publish(tx, id, 'care-profile');
  }
}
