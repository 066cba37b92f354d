import type { EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import type { TankForCare } from '../tanks';
import { careSummary } from './care-summary';
import { ConcernRow, TankReadiness } from './concern.entity';

type Changes = Pick<Deps, 'tankChanges'>;

/** A mentor says they have seen a concern, or the keeper or mentor resolves it; audited, and the tank's watchers hear. */
export async function handleConcern(
  tx: EntityManager,
  deps: Changes,
  c: ConcernRow,
  action: 'acknowledge' | 'resolve',
  p: { actorId: string; note?: string },
): Promise<ConcernRow> {
  if (c.status === 'resolved') throw errors.conflict('That concern is already resolved.');
  const now = new Date();
  const patch =
    action === 'acknowledge'
      ? {
          status: 'acknowledged' as const,
          acknowledgedById: p.actorId,
          acknowledgedAt: now,
          acknowledgeNote: p.note || null,
        }
      : {
          status: 'resolved' as const,
          resolvedById: p.actorId,
          resolvedAt: now,
          resolveNote: p.note || null,
          resolvedByTest: false,
        };
  await tx.update(ConcernRow, { id: c.id }, patch);
  await audit(tx, {
    actorId: p.actorId,
    clubId: c.clubId,
    action: `concern.${action}d`,
    targetType: 'Concern',
    targetId: c.id,
  });
  await deps.tankChanges.publish(tx, c.tankId, 'concern');
  return { ...c, ...patch };
}

export async function saveChecklist(
  m: EntityManager,
  tankId: string,
  checklist: Partial<Pick<TankReadiness, 'equipmentRunning' | 'quarantinePlan' | 'foodReady' | 'notes'>>,
): Promise<void> {
  await m.getRepository(TankReadiness).upsert({ tankId, ...checklist }, ['tankId']);
}

/** The keeper's mentor signs the tank off as ready for animals: refused (409) until everything else is met. */
export async function signOff(
  tx: EntityManager,
  deps: Changes,
  tank: TankForCare,
  p: { actorId: string; note: string },
): Promise<void> {
  const summary = await careSummary(tx, tank);
  const missing = summary.readiness.items.filter((i) => i.key !== 'mentor-sign-off' && !i.met);
  if (missing.length) {
    throw errors.conflict(
      `Not ready to sign off yet: ${missing.map((i) => i.label.toLowerCase()).join('; ')}.`,
    );
  }
  await tx
    .getRepository(TankReadiness)
    .upsert({ tankId: tank.id, signedOffById: p.actorId, signedOffAt: new Date(), signOffNote: p.note }, [
      'tankId',
    ]);
  await audit(tx, {
    actorId: p.actorId,
    clubId: tank.clubId,
    action: 'tank.signed-off',
    targetType: 'Tank',
    targetId: tank.id,
  });
  await deps.tankChanges.publish(tx, tank.id, 'sign-off');
}

export async function withdrawSignOff(
  tx: EntityManager,
  deps: Changes,
  tank: TankForCare,
  actorId: string,
): Promise<void> {
  await tx
    .getRepository(TankReadiness)
    .update({ tankId: tank.id }, { signedOffById: null, signedOffAt: null, signOffNote: null });
  await audit(tx, {
    actorId,
    clubId: tank.clubId,
    action: 'tank.sign-off-withdrawn',
    targetType: 'Tank',
    targetId: tank.id,
  });
  await deps.tankChanges.publish(tx, tank.id, 'sign-off');
}
