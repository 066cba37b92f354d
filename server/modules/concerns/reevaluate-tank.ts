import { In, type EntityManager } from 'typeorm';
import {
  dedupeConcerns,
  dueTests,
  evaluateReading,
  overdueConcerns,
  severityRank,
  type CareProfile,
  type Concern,
  type WaterTestInput,
} from '@shared/care';
import { resolveProfile } from '../care';
import { careHistory, lastKnownBefore, lastSourceNitrate, tankForCare, type TankForCare } from '../tanks';
import { ConcernRow, TankReadiness } from './concern.entity';

export interface Reevaluation {
  raised: ConcernRow[];
  changed: ConcernRow[];
  cleared: ConcernRow[];
}

const STOCKED_WITHOUT_SIGN_OFF = 'stocking.without-sign-off';

/** Rules recomputed from scratch each time: absent now means gone. */
const RECOMPUTED = (rule: string) => rule.startsWith('schedule.') || rule.startsWith('stocking.');

function stockingConcern(): Concern {
  return {
    // Not about one parameter: the care engine's Concern has no other slot for it, so it is named apart.
    parameter: 'stocking' as Concern['parameter'],
    severity: 'caution',
    rule: STOCKED_WITHOUT_SIGN_OFF,
    reason: 'Animals were added before a mentor signed the tank off as ready.',
    nextSteps: [
      'Test ammonia and nitrite daily for the next two weeks.',
      'Ask your mentor to look over the tank.',
    ],
  };
}

/** Whether the latest test measured what the concern is about, so its silence now means "cleared". */
function measuredBy(latest: WaterTestInput | undefined, concern: ConcernRow): boolean {
  if (!latest) return false;
  const p = concern.parameter === 'freeAmmonia' ? 'ammonia' : concern.parameter;
  return (latest.values as Record<string, number | undefined>)[p] !== undefined;
}

export async function concernsFor(
  m: EntityManager,
  tank: TankForCare,
  profile: CareProfile,
  now: Date,
): Promise<{ concerns: Concern[]; latest?: WaterTestInput }> {
  const history = await careHistory(m, tank.id, now);
  const latest = history.at(-1);
  const fired: Concern[] = [];
  if (latest) {
    const sourceNitrate = await lastSourceNitrate(m, tank.id);
    fired.push(
      ...evaluateReading(latest, profile, {
        tank: {
          volumeL: tank.volumeL,
          phase: tank.phase,
          systemType: tank.systemType,
          hasLivestock: tank.hasLivestock,
        },
        history,
        // The same last known values the test's stored free ammonia used, however old.
        lastKnown: await lastKnownBefore(m, tank.id, latest),
        sourceWater: sourceNitrate === undefined ? undefined : { nitrate: sourceNitrate },
        now: now.toISOString(),
      }),
    );
  }
  fired.push(
    ...overdueConcerns(
      dueTests(
        { phase: tank.phase, systemType: tank.systemType, profile, createdAt: tank.createdAt },
        history,
        now.toISOString(),
      ),
    ),
  );
  if (tank.hasLivestock) {
    const readiness = await m.findOneBy(TankReadiness, { tankId: tank.id });
    if (!readiness?.signedOffAt) fired.push(stockingConcern());
  }
  return { concerns: dedupeConcerns(fired), latest };
}

/**
 * Brings a tank's stored concerns in line with its current readings: one live concern per cause,
 * updated in place; a cause that a later test no longer shows is resolved (and stays in history).
 */
export async function reevaluateTank(
  tx: EntityManager,
  tankId: string,
  now = new Date(),
): Promise<Reevaluation> {
  const result: Reevaluation = { raised: [], changed: [], cleared: [] };
  const tank = await tankForCare(tx, tankId);
  if (!tank || tank.archived) return result;
  const profile = await resolveProfile(tx, tank.clubId, tank.careProfileKey);
  if (!profile) return result;
  const { concerns, latest } = await concernsFor(tx, tank, profile, now);

  const live = await tx
    .createQueryBuilder(ConcernRow, 'c')
    .setLock('pessimistic_write')
    .where("c.tank_id = :tankId AND c.status <> 'resolved'", { tankId })
    .getMany();
  const liveByRule = new Map(live.map((c) => [c.rule, c]));
  const latestId = latest?.id ?? null;

  for (const c of concerns) {
    const fields = {
      parameter: c.parameter,
      severity: c.severity,
      reason: c.reason,
      nextSteps: c.nextSteps,
      waterChanges: c.waterChanges ?? null,
      value: c.value ?? null,
      unit: c.unit ?? null,
      lastSeenAt: now,
    };
    const existing = liveByRule.get(c.rule);
    if (existing) {
      liveByRule.delete(c.rule);
      const worse = severityRank(c.severity) > severityRank(existing.severity);
      const same = existing.severity === c.severity && existing.reason === c.reason;
      // A concern that got worse needs eyes again even if someone had acknowledged it.
      const status = worse ? 'open' : existing.status;
      await tx.update(
        ConcernRow,
        { id: existing.id },
        { ...fields, status, waterTestId: RECOMPUTED(c.rule) ? existing.waterTestId : latestId },
      );
      if (!same) result.changed.push({ ...existing, ...fields, status });
    } else {
      const row = tx.create(ConcernRow, {
        ...fields,
        clubId: tank.clubId,
        tankId,
        ownerId: tank.ownerId,
        rule: c.rule,
        status: 'open',
        raisedAt: now,
        waterTestId: RECOMPUTED(c.rule) ? null : latestId,
        acknowledgedById: null,
        acknowledgedAt: null,
        acknowledgeNote: null,
        resolvedById: null,
        resolvedAt: null,
        resolveNote: null,
        resolvedByTest: false,
      });
      result.raised.push(await tx.save(row));
    }
  }
  const toClear = [...liveByRule.values()].filter((c) => RECOMPUTED(c.rule) || measuredBy(latest, c));
  if (toClear.length) {
    await tx.update(
      ConcernRow,
      { id: In(toClear.map((c) => c.id)) },
      {
        status: 'resolved',
        resolvedAt: now,
        resolvedByTest: true,
        resolveNote: 'A later test no longer shows it.',
      },
    );
    result.cleared.push(...toClear.map((c) => ({ ...c, status: 'resolved' as const, resolvedAt: now })));
  }
  return result;
}
