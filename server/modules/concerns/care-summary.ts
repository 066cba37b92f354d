import type { EntityManager } from 'typeorm';
import { CYCLE_DURATION_WEEKS, cycleStage, dueTests, stockingReadiness } from '@shared/care';
import { errors } from '../../lib/app-error';
import { resolveProfile } from '../care';
import { careHistory, type TankForCare } from '../tanks';
import { ConcernRow, TankReadiness } from './concern.entity';
import { presentConcern } from './concern.presenter';

/** Everything the tank page's care section shows: cycle stage, due tests, stocking checklist, live concerns. */
export async function careSummary(m: EntityManager, tank: TankForCare, now = new Date()) {
  const profile = await resolveProfile(m, tank.clubId, tank.careProfileKey);
  if (!profile)
    throw errors.conflict(
      'This tank follows a care profile that no longer exists. Choose another on the tank settings.',
    );
  const history = await careHistory(m, tank.id, now);
  const iso = now.toISOString();
  const cycle = cycleStage(history, { now: iso });
  const readinessRow = await m.findOneBy(TankReadiness, { tankId: tank.id });
  const checklist = {
    equipmentRunning: readinessRow?.equipmentRunning ?? false,
    quarantinePlan: readinessRow?.quarantinePlan ?? false,
    foodReady: readinessRow?.foodReady ?? false,
  };
  const signOff = readinessRow?.signedOffAt
    ? { mentorId: readinessRow.signedOffById!, signedAt: readinessRow.signedOffAt.toISOString() }
    : null;
  const readiness = stockingReadiness({
    stage: cycle.stage,
    recentTests: history,
    profile,
    checklist,
    signOff,
    now: iso,
  });
  const concerns = await m.find(ConcernRow, {
    where: [
      { tankId: tank.id, status: 'open' },
      { tankId: tank.id, status: 'acknowledged' },
    ],
    order: { raisedAt: 'DESC' },
  });
  return {
    profile: { key: profile.key, name: profile.name, version: profile.version, animals: profile.animals },
    cycle,
    cycleTypical: CYCLE_DURATION_WEEKS,
    due: dueTests(
      { phase: tank.phase, systemType: tank.systemType, profile, createdAt: tank.createdAt },
      history,
      iso,
    ),
    readiness: {
      ...readiness,
      checklist,
      notes: readinessRow?.notes ?? '',
      signOff: signOff ? { ...signOff, note: readinessRow?.signOffNote ?? '' } : null,
    },
    concerns: concerns.map(presentConcern),
  };
}
