import type { EntityManager } from 'typeorm';
import { asSubject } from '../../../shared/abilities';
import { severityRank, type Severity } from '../../../shared/care';
import type { TankChangedPayload } from '../../../shared/events/socket-events';
import { afterCommit } from '../../db/after-commit';
import { loadViewer } from '../access/viewer.service';
import { maybeDeliveryFor } from '../notifications/delivery';
import { notify } from '../notifications/notify';
import type { ConcernRow } from './concern.entity';
import { reevaluateTank, type Reevaluation } from './reevaluate-tank';

function worstOf(rows: readonly ConcernRow[]): Severity | null {
  return rows.reduce<Severity | null>((w, c) => (w === null || severityRank(c.severity) > severityRank(w) ? c.severity : w), null);
}

/** The keeper's current mentors in the club: the people a concern on their tank is for. */
async function mentorsOf(tx: EntityManager, clubId: string, ownerId: string): Promise<string[]> {
  const rows: { mentorId: string }[] = await tx.query(
    `SELECT mentor_id AS "mentorId" FROM mentor_assignment WHERE club_id = $1 AND mentee_id = $2 AND ended_at IS NULL`,
    [clubId, ownerId],
  );
  return rows.map((r) => r.mentorId);
}

/**
 * Something about a tank changed (a test saved, edited or deleted, animals added or removed, its profile or phase
 * changed): bring its concerns up to date in the same transaction, tell the mentor about new urgent or caution
 * concerns, and after commit tell everyone allowed to read the tank that it changed.
 */
export async function tankChanged(tx: EntityManager, tankId: string): Promise<Reevaluation> {
  const reevaluation = await reevaluateTank(tx, tankId);
  const [tank] = (await tx.query(`SELECT club_id AS "clubId", owner_id AS "ownerId", name FROM tank WHERE id = $1`, [tankId])) as { clubId: string; ownerId: string; name: string }[];
  const delivery = maybeDeliveryFor(tx);
  if (!tank || !delivery) return reevaluation;

  const fresh = [...reevaluation.raised, ...reevaluation.changed].filter((c) => c.severity !== 'info' && c.status === 'open');
  const mentors = fresh.length ? await mentorsOf(tx, tank.clubId, tank.ownerId) : [];
  for (const c of fresh) {
    await notify(tx, {
      userIds: mentors,
      clubId: tank.clubId,
      kind: c.severity === 'urgent' ? 'concern.urgent' : 'concern.caution',
      title: `${tank.name}: ${c.reason}`,
      body: c.nextSteps.join(' '),
      link: `/tanks/${tankId}`,
      subject: { type: 'Concern', id: c.id },
    });
  }

  announceTankChange(tx, { id: tankId, clubId: tank.clubId, ownerId: tank.ownerId }, {
    raised: reevaluation.raised.length,
    cleared: reevaluation.cleared.length,
    worst: worstOf(fresh),
  });
  return reevaluation;
}

/**
 * After commit (at once outside a transaction): a `tankChanged` event to every connected person whose permissions,
 * loaded fresh at that moment, let them watch the tank (keeper, current mentor, admins).
 */
export function announceTankChange(
  manager: EntityManager,
  tank: { id: string; clubId: string; ownerId: string },
  counts: Omit<TankChangedPayload, 'clubId' | 'tankId'> = { raised: 0, cleared: 0, worst: null },
): void {
  const delivery = maybeDeliveryFor(manager);
  if (!delivery) return;
  const dataSource = manager.connection;
  const payload = { clubId: tank.clubId, tankId: tank.id, ...counts };
  const mayRead = async (userId: string) => {
    const viewer = await loadViewer(dataSource.manager, userId);
    return viewer?.ability.can('watch', asSubject('Tank', { clubId: tank.clubId, ownerId: tank.ownerId })) ?? false;
  };
  afterCommit(manager, () => {
    void (async () => {
      await delivery.hub.emitToReaders(tank.clubId, mayRead, 'tankChanged', payload);
      if (counts.raised || counts.cleared || counts.worst) await delivery.hub.emitToReaders(tank.clubId, mayRead, 'concern', payload);
    })();
  });
}
