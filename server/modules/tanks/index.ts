/**
 * What other modules may use of tanks: find a tank, refuse an archived one, and save a water test through the one
 * path that normalizes, derives, re-judges the tank and announces the change.
 */
export { loadTank, ownedBy, requireActive } from './tank-access';
export type { Tank } from './tank.entity';
export { createWaterTest, type SavedWaterTest } from './water-test.service';
export { presentWaterTest } from './water-test.presenter';
