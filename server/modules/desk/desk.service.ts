import type { EntityManager } from 'typeorm';
import type { AppAbility } from '@shared/abilities';
import {
  cycleStage,
  isTrendRule,
  parameterInfo,
  rankTanks,
  severityRank,
  type ParameterKey,
  type TankState,
} from '@shared/care';
import type { DeskRow, DeskView } from '@shared/schemas/desk.schema';
import { abilityCondition } from '../access';
import { ConcernRow } from '../concerns';
import { unansweredCountsByTank } from '../questions';
import { careHistory } from '../tanks';
import { DAY_MS } from '@shared/care/time';

const SPARK_DAYS = 14;

export interface DeskFilters {
  urgentOnly?: boolean;
  cycling?: boolean;
  unanswered?: boolean;
}

interface TankRow {
  id: string;
  name: string;
  ownerId: string;
  ownerName: string;
  phase: 'cycling' | 'established';
  systemType: string;
  createdAt: Date;
}

/**
 * The tanks a mentor watches (their current mentees'; all of the club's for an admin), most in need first,
 * ranked by the care engine's triage score. The same rules that decide live updates pick the tanks, in SQL.
 */
export async function buildDesk(
  m: EntityManager,
  p: { clubId: string; viewerId: string; ability: AppAbility; filters: DeskFilters; now?: Date },
): Promise<DeskView> {
  const now = p.now ?? new Date();
  const watch = abilityCondition(p.ability, 'watch', 'Tank', { clubId: 't.club_id', ownerId: 't.owner_id' });
  const tanks: TankRow[] = await m
    .createQueryBuilder()
    .select([
      't.id AS id',
      't.name AS name',
      't.owner_id AS "ownerId"',
      'u.display_name AS "ownerName"',
      't.phase AS phase',
      't.system_type AS "systemType"',
      't.created_at AS "createdAt"',
    ])
    .from('tank', 't')
    .innerJoin('app_user', 'u', 'u.id = t.owner_id')
    .where('t.club_id = :clubId AND t.archived_at IS NULL AND t.owner_id <> :viewerId', {
      clubId: p.clubId,
      viewerId: p.viewerId,
    })
    .andWhere(watch.sql, watch.params)
    .getRawMany();
  if (!tanks.length) return { rows: [], total: 0, generatedAt: now.toISOString() };

  const ids = tanks.map((t) => t.id);
  const concerns = await m
    .createQueryBuilder(ConcernRow, 'c')
    .where("c.tank_id IN (:...ids) AND c.status <> 'resolved'", { ids })
    .getMany();
  const unanswered = await unansweredCountsByTank(m, p.clubId, ids);

  const rows: DeskRow[] = [];
  const states: TankState[] = [];
  for (const t of tanks) {
    const history = await careHistory(m, t.id, now, 60);
    const last = history.at(-1);
    const mine = concerns
      .filter((c) => c.tankId === t.id)
      .sort((a, b) => severityRank(b.severity) - severityRank(a.severity) || +b.raisedAt - +a.raisedAt);
    const worst = mine[0];
    const sparkParam =
      worst &&
      worst.parameter in
        {
          temperature: 1,
          salinity: 1,
          pH: 1,
          ammonia: 1,
          nitrite: 1,
          nitrate: 1,
          alkalinity: 1,
          calcium: 1,
          magnesium: 1,
          phosphate: 1,
        }
        ? (worst.parameter as ParameterKey)
        : undefined;
    const sinceSpark = now.getTime() - SPARK_DAYS * DAY_MS;
    const createdAt = new Date(t.createdAt).toISOString();
    states.push({
      tankId: t.id,
      createdAt,
      lastTestAt: last?.takenAt ?? null,
      openConcerns: mine.map((c) => ({ severity: c.severity, raisedAt: c.raisedAt.toISOString() })),
      risingTrends: mine.filter((c) => isTrendRule(c.rule)).length,
      unansweredQuestions: unanswered.get(t.id) ?? 0,
      phase: t.phase,
    });
    rows.push({
      tankId: t.id,
      name: t.name,
      owner: { id: t.ownerId, displayName: t.ownerName },
      phase: t.phase,
      systemType: t.systemType,
      cycleStage: cycleStage(history, { now: now.toISOString() }).stage,
      lastTestAt: last?.takenAt ?? null,
      daysSinceTest: last ? Math.floor((now.getTime() - Date.parse(last.takenAt)) / DAY_MS) : null,
      unansweredQuestions: unanswered.get(t.id) ?? 0,
      openConcerns: {
        urgent: mine.filter((c) => c.severity === 'urgent').length,
        caution: mine.filter((c) => c.severity === 'caution').length,
        info: mine.filter((c) => c.severity === 'info').length,
      },
      worstConcern: worst
        ? {
            id: worst.id,
            severity: worst.severity,
            reason: worst.reason,
            parameter: worst.parameter,
            raisedAt: worst.raisedAt.toISOString(),
            status: worst.status as 'open' | 'acknowledged',
          }
        : null,
      sparkline: sparkParam
        ? {
            parameter: sparkParam,
            unit: parameterInfo(sparkParam).unit,
            points: history
              .filter((h) => Date.parse(h.takenAt) >= sinceSpark && h.values[sparkParam] !== undefined)
              .map((h) => ({ at: h.takenAt, value: h.values[sparkParam]! })),
          }
        : null,
      score: 0,
      why: [],
    });
  }
  const ranked = rankTanks(states, now.toISOString());
  const byId = new Map(rows.map((r) => [r.tankId, r]));
  const ordered = ranked.map((r) => ({ ...byId.get(r.tankId)!, score: r.score, why: r.parts }));
  const filtered = ordered.filter(
    (r) =>
      (!p.filters.urgentOnly || r.openConcerns.urgent > 0) &&
      (!p.filters.cycling || r.phase === 'cycling') &&
      (!p.filters.unanswered || r.unansweredQuestions > 0),
  );
  return { rows: filtered, total: ordered.length, generatedAt: now.toISOString() };
}
