import { currentMentorsOf } from '../mentorship';
import type { TankChangeListener } from '../tanks';
import type { Notify } from './notify';

/** Listens on the tank-changed seam: each concern that needs attention is told to the keeper's current mentors. */
export function tellMentorsOfConcerns(notify: Notify): TankChangeListener {
  return async (tx, { tank }, verdict) => {
    if (!verdict.needsAttention.length) return;
    const mentors = await currentMentorsOf(tx, tank.clubId, tank.ownerId);
    for (const c of verdict.needsAttention) {
      await notify(tx, {
        userIds: mentors,
        clubId: tank.clubId,
        kind: c.severity === 'urgent' ? 'concern.urgent' : 'concern.caution',
        title: `${tank.name}: ${c.reason}`,
        body: c.nextSteps.join(' '),
        link: `/tanks/${tank.id}`,
        subject: { type: 'Concern', id: c.id },
      });
    }
  };
}
