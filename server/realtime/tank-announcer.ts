import { asSubject } from '@shared/abilities';
import { severityRank, type Severity } from '@shared/care';
import { afterCommit } from '../db/after-commit';
import { loadViewer } from '../modules/access';
import type { JudgedConcern, TankChangeListener } from '../modules/tanks';
import type { RealtimeHub } from './hub';

function worstOf(concerns: readonly JudgedConcern[]): Severity | null {
  return concerns.reduce<Severity | null>(
    (w, c) => (w === null || severityRank(c.severity) > severityRank(w) ? c.severity : w),
    null,
  );
}

/**
 * Listens on the tank-changed seam: after commit, a `tankChanged` event (and `concern` when concerns were raised,
 * worsened or cleared) to every connected person whose permissions, loaded fresh at that moment, let them watch the
 * tank (keeper, current mentor, admins).
 */
export function announceTankChanges(hub: RealtimeHub): TankChangeListener {
  return async (tx, { tank }, verdict) => {
    const payload = {
      clubId: tank.clubId,
      tankId: tank.id,
      raised: verdict.raised,
      cleared: verdict.cleared,
      worst: worstOf(verdict.needsAttention),
    };
    const manager = tx.connection.manager;
    const mayWatch = async (userId: string) => {
      const viewer = await loadViewer(manager, userId);
      return (
        viewer?.ability.can('watch', asSubject('Tank', { clubId: tank.clubId, ownerId: tank.ownerId })) ??
        false
      );
    };
    afterCommit(tx, () => {
      void (async () => {
        await hub.emitToReaders(tank.clubId, mayWatch, 'tankChanged', payload);
        if (payload.raised || payload.cleared || payload.worst)
          await hub.emitToReaders(tank.clubId, mayWatch, 'concern', payload);
      })();
    });
  };
}
