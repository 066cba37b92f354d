import type { TankJudge } from '../tanks';
import { reevaluateTank } from './reevaluate-tank';

/**
 * The tank-changed seam's judge: re-judges the tank and reports what a mentor should hear of, the open urgent and
 * caution concerns this change raised or worsened.
 */
export const judgeConcerns: TankJudge = async (tx, tank) => {
  const { raised, changed, cleared } = await reevaluateTank(tx, tank.id);
  return {
    raised: raised.length,
    cleared: cleared.length,
    needsAttention: [...raised, ...changed].filter((c) => c.severity !== 'info' && c.status === 'open'),
  };
};
